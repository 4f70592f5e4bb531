import type { TreeVersionDetail } from '@heatpath/contracts';
import { validateTree } from '@heatpath/fault-tree';
import { cleanup, fireEvent, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { errorResponse, json, makeMe, mockApi, type RecordedRequest } from '../../../test/api-mock';
import { renderApp } from '../../../test/render-app';

const treeId = '00000000-0000-4000-8000-0000000000e1';

// A small tree with one way on that leads nowhere ("missing-step"), so it has exactly one problem.
function definition(overrides: { noTarget?: string } = {}) {
  return {
    format: 'heatpath.tree',
    formatVersion: 1,
    id: 'hot-at-idle',
    title: 'Hot at idle',
    symptom: 'Runs hot at idle',
    start: 'ask',
    computed: [],
    nodes: {
      ask: {
        kind: 'question',
        title: 'When does it run hot?',
        prompt: 'Ask the driver when the gauge climbs.',
        choices: [
          { id: 'idle', label: 'At idle', to: 'measure' },
          { id: 'speed', label: 'At speed', to: overrides.noTarget ?? 'missing-step' },
        ],
      },
      measure: {
        kind: 'measurement',
        title: 'Coolant temperature',
        prompt: 'Read the coolant temperature.',
        inputs: [
          {
            name: 'coolantTemp',
            label: 'Coolant',
            quantity: 'temperature',
            unit: 'degC',
            range: { min: -40, max: 150 },
          },
        ],
        branches: [{ when: 'coolantTemp > 105', to: 'hot', label: 'Too hot' }],
        fallback: { to: 'fine', label: 'Normal' },
      },
      hot: {
        kind: 'outcome',
        title: 'Cooling fan not switching',
        rootCause: 'The fan does not switch on.',
        correction: 'Repair the fan circuit.',
      },
      fine: {
        kind: 'outcome',
        title: 'Cooling normal',
        rootCause: 'The system cools normally.',
        correction: 'No repair needed.',
      },
    },
  };
}

function draft(revision: number, def: unknown = definition()): TreeVersionDetail {
  return {
    id: '00000000-0000-4000-8000-0000000000f2',
    treeId,
    version: 2,
    status: 'draft',
    changeNote: null,
    publishedAt: null,
    publishedBy: null,
    retiredAt: null,
    revision,
    updatedAt: '2026-12-01T10:00:00.000Z',
    caseCount: 0,
    basedOnVersion: 1,
    publishConfirmation: null,
    definition: def,
    problems: validateTree(def),
  };
}

// React Flow measures its nodes; jsdom has no layout, so give it fixed sizes.
class ResizeObserverStub {
  observe() {}
  unobserve() {}
  disconnect() {}
}

beforeEach(() => {
  vi.stubGlobal('ResizeObserver', ResizeObserverStub);
  vi.stubGlobal(
    'DOMMatrixReadOnly',
    class {
      m22: number;
      constructor(transform?: string) {
        const scale = transform?.match(/scale\(([1-9.])\)/)?.[1];
        this.m22 = scale ? Number(scale) : 1;
      }
    },
  );
});

afterEach(() => {
  cleanup();
  vi.useRealTimers();
  vi.unstubAllGlobals();
});

describe('the draft editor', () => {
  it('lists every problem, marks its step in the graph, and a problem selects its step', async () => {
    mockApi({
      'GET /api/me': () => json(makeMe()),
      [`GET /api/trees/${treeId}/draft`]: () => json(draft(3)),
    });
    renderApp(`/trees/${treeId}/draft`);

    // The first test also waits for the lazily loaded editor module.
    const problems = await screen.findByRole('list', { name: 'Problems' }, { timeout: 10_000 });
    const items = within(problems).getAllByRole('button');
    expect(items).toHaveLength(1);
    expect(items[0]?.textContent).toContain('When does it run hot?');
    expect(items[0]?.textContent).toMatch(/missing-step/);

    // The step is marked in the graph in words, not only by its outline.
    const graph = screen.getByRole('region', { name: 'Tree graph' });
    const node = await within(graph).findByRole('button', { name: 'When does it run hot?' });
    expect(node.textContent).toContain('1 problem');

    // Select another step, then follow the problem back to the box it is about.
    fireEvent.click(within(graph).getByRole('button', { name: 'Coolant temperature' }));
    expect(await screen.findByRole('form', { name: 'Edit “Coolant temperature”' })).toBeTruthy();
    await userEvent.setup().click(items[0]!);
    expect(await screen.findByRole('form', { name: 'Edit “When does it run hot?”' })).toBeTruthy();
    const answer = screen.getByRole('group', { name: 'Answer 2: At speed' });
    const target = within(answer).getByLabelText('Leads to');
    await waitFor(() => expect(document.activeElement).toBe(target));
    expect(target.getAttribute('aria-invalid')).toBe('true');
  });

  it('checks a formula as it is typed and works it out on sample values', async () => {
    mockApi({
      'GET /api/me': () => json(makeMe()),
      [`GET /api/trees/${treeId}/draft`]: () => json(draft(3)),
      [`PUT /api/trees/${treeId}/draft`]: (request) =>
        json(draft(4, (request.body as { definition: unknown }).definition)),
    });
    renderApp(`/trees/${treeId}/draft`);
    const user = userEvent.setup();
    const graph = await screen.findByRole('region', { name: 'Tree graph' });
    fireEvent.click(await within(graph).findByRole('button', { name: 'Coolant temperature' }));

    const branch = await screen.findByRole('group', { name: 'Branch 1: Too hot' });
    const condition = within(branch).getByLabelText('Condition');
    await user.clear(condition);
    await user.type(condition, 'coolantTemp > 105 and engineHot');
    expect(
      await within(branch).findByText(
        '"engineHot" is not a reading or computed value of this tree.',
      ),
    ).toBeTruthy();

    await user.clear(condition);
    await user.type(condition, 'coolantTemp > 221 degF');
    expect(
      await within(branch).findByText(/Formula reads well: it gives a yes\/no result/),
    ).toBeTruthy();
    await user.type(within(branch).getByLabelText('Sample coolantTemp'), '104');
    expect(within(branch).getByText('does not hold (false)')).toBeTruthy();
    await user.clear(within(branch).getByLabelText('Sample coolantTemp'));
    await user.type(within(branch).getByLabelText('Sample coolantTemp'), '106');
    expect(within(branch).getByText('holds (true)')).toBeTruthy();
  });

  it('saves automatically, and a stale save offers to reload theirs or compare — never overwrites', async () => {
    const theirs = definition({ noTarget: 'fine' });
    theirs.nodes.fine.title = 'Cooling works as it should';
    let draftReads = 0;
    const { requests } = mockApi({
      'GET /api/me': () => json(makeMe()),
      [`GET /api/trees/${treeId}/draft`]: () => {
        draftReads += 1;
        return json(draftReads === 1 ? draft(3) : draft(5, theirs));
      },
      [`PUT /api/trees/${treeId}/draft`]: () =>
        errorResponse(
          409,
          'conflict',
          'Someone else saved this draft after you opened it (now revision 5). Reload it, or compare your changes first.',
        ),
    });
    renderApp(`/trees/${treeId}/draft`);
    const user = userEvent.setup();
    const title = await screen.findByLabelText('Title');
    await user.type(title, ' (mine)');

    const alert = await screen.findByRole('alert');
    await waitFor(() =>
      expect(alert.textContent).toContain('Not saved: someone else saved this draft'),
    );
    const puts = requests.filter((request: RecordedRequest) => request.method === 'PUT');
    expect(puts).toHaveLength(1);
    expect((puts[0]?.body as { revision: number }).revision).toBe(3);

    // Compare: their copy beside mine, step by step.
    await user.click(within(alert).getByRole('button', { name: 'Compare' }));
    const comparison = await screen.findByRole('region', { name: 'Their draft and yours' });
    expect(
      within(comparison).getByText('“Cooling works as it should” — differs in: title'),
    ).toBeTruthy();
    expect(within(comparison).getByText('“Cooling normal” — differs in: title')).toBeTruthy();
    expect(
      within(comparison).getByRole('button', { name: 'Keep mine and save over theirs' }),
    ).toBeTruthy();

    // Nothing was sent again while the conflict stands, even once the autosave delay is over
    // (the clock is moved past it rather than waited for).
    vi.useFakeTimers({ toFake: ['setTimeout', 'clearTimeout'], shouldAdvanceTime: true });
    await user.type(screen.getByLabelText('Title'), '!');
    await vi.advanceTimersByTimeAsync(1000);
    expect(requests.filter((request) => request.method === 'PUT')).toHaveLength(1);

    await user.click(within(comparison).getByRole('button', { name: 'Reload theirs' }));
    await waitFor(() =>
      expect(screen.queryByRole('region', { name: 'Their draft and yours' })).toBeNull(),
    );
    expect((screen.getByLabelText('Title') as HTMLInputElement).value).toBe(
      'When does it run hot?',
    );
    const graph = screen.getByRole('region', { name: 'Tree graph' });
    expect(
      await within(graph).findByRole('button', { name: 'Cooling works as it should' }),
    ).toBeTruthy();
  });

  it('adds a step of the chosen kind, shown in the graph and listed as unreachable, until a way on leads there', async () => {
    mockApi({
      'GET /api/me': () => json(makeMe()),
      [`GET /api/trees/${treeId}/draft`]: () => json(draft(3)),
      [`PUT /api/trees/${treeId}/draft`]: (request) =>
        json(draft(4, (request.body as { definition: unknown }).definition)),
    });
    renderApp(`/trees/${treeId}/draft`);
    const user = userEvent.setup();
    await screen.findByRole('region', { name: 'Tree graph' });
    await user.selectOptions(screen.getByLabelText('Kind of step'), 'procedure');
    await user.click(screen.getByRole('button', { name: /Add step/ }));
    expect(await screen.findByRole('form', { name: 'Edit “New procedure”' })).toBeTruthy();
    const graph = screen.getByRole('region', { name: 'Tree graph' });
    expect(await within(graph).findByRole('button', { name: 'New procedure' })).toBeTruthy();
    // The new step is not reached from the start yet: validation says so.
    const problems = screen.getByRole('list', { name: 'Problems' });
    await waitFor(() => expect(problems.textContent).toMatch(/New procedure/));
    await user.type(screen.getByLabelText('Instruction'), 'Check the fan fuse.');
    await waitFor(() =>
      expect(screen.getByRole('list', { name: 'Problems' }).textContent).toContain(
        '"New procedure" cannot be reached',
      ),
    );
    expect(screen.getByText(/Added “New procedure”\. Connect it/)).toBeTruthy();

    // Connected from an existing answer: it is reached, and the "connect it" notice has gone.
    fireEvent.click(within(graph).getByRole('button', { name: 'When does it run hot?' }));
    const answer = await screen.findByRole('group', { name: 'Answer 2: At speed' });
    await user.selectOptions(within(answer).getByLabelText('Leads to'), 'new-procedure');
    await waitFor(() =>
      expect(screen.getByRole('list', { name: 'Problems' }).textContent).not.toContain(
        '"New procedure" cannot be reached',
      ),
    );
    expect(screen.queryByText(/Added “New procedure”\. Connect it/)).toBeNull();
  });
});

describe('try it', () => {
  it('says why a draft with problems cannot be walked, and walks a clean one without a case', async () => {
    const clean = definition({ noTarget: 'fine' });
    const { requests } = mockApi({
      'GET /api/me': () => json(makeMe()),
      [`GET /api/trees/${treeId}/draft`]: () => json(draft(3, clean)),
    });
    renderApp(`/trees/${treeId}/draft`);
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: 'Try it' }));
    const preview = await screen.findByRole('region', { name: 'Try it' });
    await user.click(within(preview).getByRole('button', { name: 'At idle' }));
    const readings = await within(preview).findByRole('form', { name: 'Readings' });
    await user.selectOptions(within(readings).getByLabelText('Unit for Coolant'), 'degF');
    await user.type(within(readings).getByLabelText('Coolant'), '230');
    expect(within(readings).getByText(/finding “Cooling fan not switching”/)).toBeTruthy();
    await user.click(within(readings).getByRole('button', { name: 'Save reading' }));
    expect(await within(preview).findByText('Finding reached')).toBeTruthy();
    expect(within(preview).getByText('Repair the fan circuit.')).toBeTruthy();
    // The preview never talks to the cases API.
    expect(requests.some((request) => request.path.startsWith('/api/cases'))).toBe(false);
  });

  it('refuses to walk a draft that does not compile', async () => {
    mockApi({
      'GET /api/me': () => json(makeMe()),
      [`GET /api/trees/${treeId}/draft`]: () => json(draft(3)),
    });
    renderApp(`/trees/${treeId}/draft`);
    await userEvent.setup().click(await screen.findByRole('button', { name: 'Try it' }));
    const preview = await screen.findByRole('region', { name: 'Try it' });
    expect(within(preview).getByText('Not ready to try yet')).toBeTruthy();
    expect(preview.textContent).toContain('1 problem');
  });
});
