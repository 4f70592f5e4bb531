import type { RegressionReport, TreeLibraryEntry, TreeVersionDetail } from '@heatpath/contracts';
import { cleanup, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { errorResponse, json, makeMe, mockApi } from '../../../test/api-mock';
import { renderApp } from '../../../test/render-app';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const treeId = '00000000-0000-4000-8000-0000000000e1';
const caseId = '00000000-0000-4000-8000-0000000000c7';
const publisher = { id: '00000000-0000-4000-8000-000000000001', name: 'Rosa Quell' };

function version(overrides: Partial<TreeVersionDetail>): TreeVersionDetail {
  return {
    id: '00000000-0000-4000-8000-0000000000f1',
    treeId,
    version: 1,
    status: 'published',
    changeNote: 'First version.',
    publishedAt: '2026-11-20T09:00:00.000Z',
    publishedBy: publisher,
    retiredAt: null,
    revision: 1,
    updatedAt: '2026-11-20T09:00:00.000Z',
    caseCount: 6,
    basedOnVersion: null,
    publishConfirmation: null,
    definition: {},
    problems: [],
    ...overrides,
  };
}

const draft = version({
  id: '00000000-0000-4000-8000-0000000000f2',
  version: 2,
  status: 'draft',
  changeNote: null,
  publishedAt: null,
  publishedBy: null,
  revision: 7,
  caseCount: 0,
  basedOnVersion: 1,
});

function entry(
  overrides: Partial<TreeLibraryEntry & { regressionCaseIds: string[] }> = {},
): TreeLibraryEntry & {
  regressionCaseIds: string[];
} {
  const v1 = version({});
  return {
    id: treeId,
    key: 'hot-at-idle',
    title: 'Hot at idle',
    symptom: 'Runs hot at idle',
    latestPublished: v1,
    draft,
    versions: [v1, draft],
    regressionCaseIds: [caseId],
    ...overrides,
  };
}

const report: RegressionReport = {
  draftRevision: 7,
  summary: { 'same-outcome': 0, 'different-outcome': 1, diverged: 0, 'no-outcome': 0 },
  results: [
    {
      caseId,
      reference: 'C-00012',
      fromVersion: 1,
      inRegressionSet: true,
      expectedOutcome: 'fan-stage',
      expectedOutcomeTitle: 'Fan stage not switching',
      verdict: 'different-outcome',
      newOutcome: 'thermostat',
      newOutcomeTitle: 'Thermostat sticking closed',
      divergence: null,
    },
  ],
};

describe('check and publish', () => {
  it('shows the cases whose finding would change and publishes only on “Publish anyway”', async () => {
    const publishes: unknown[] = [];
    let published = false;
    mockApi({
      'GET /api/me': () => json(makeMe()),
      [`GET /api/trees/${treeId}/draft`]: () => json(draft),
      [`GET /api/trees/${treeId}`]: () =>
        json(
          published
            ? entry({ draft: null, versions: [version({}), { ...draft, status: 'published' }] })
            : entry(),
        ),
      [`POST /api/trees/${treeId}/draft/regression`]: () => json(report),
      [`POST /api/trees/${treeId}/draft/publish`]: (request) => {
        publishes.push(request.body);
        if (!(request.body as { confirmChangedOutcomes: boolean }).confirmChangedOutcomes) {
          return errorResponse(
            409,
            'conflict',
            '1 case(s) in the regression set would no longer reach the outcome they reached (C-00012). Confirm to publish anyway.',
            { 'C-00012': 'different-outcome' },
          );
        }
        published = true;
        return json({ ...draft, status: 'published', changeNote: 'Fan check first.' });
      },
    });
    renderApp(`/trees/${treeId}/draft/publish`);
    const user = userEvent.setup();
    await user.type(
      await screen.findByLabelText('Change note', {}, { timeout: 10_000 }),
      'Fan check first.',
    );
    await user.click(screen.getByRole('button', { name: 'Publish' }));

    const warning = await screen.findByRole('alert');
    expect(warning.textContent).toContain('C-00012');
    expect(within(warning).getByText('Different finding')).toBeTruthy();
    // The replay that runs with the refusal says what the case reaches now.
    expect(
      await within(warning).findByText(/Fan stage not switching → Thermostat sticking closed/),
    ).toBeTruthy();
    expect(publishes).toHaveLength(1);

    await user.click(within(warning).getByRole('button', { name: 'Publish anyway' }));
    expect(await screen.findByText('Version 2 published')).toBeTruthy();
    expect(publishes[1]).toEqual({
      revision: 7,
      changeNote: 'Fan check first.',
      confirmChangedOutcomes: true,
    });
  });

  it('replays finished cases in a table and saves the chosen regression set', async () => {
    const { requests } = mockApi({
      'GET /api/me': () => json(makeMe()),
      [`GET /api/trees/${treeId}/draft`]: () => json(draft),
      [`GET /api/trees/${treeId}`]: () => json(entry({ regressionCaseIds: [] })),
      [`POST /api/trees/${treeId}/draft/regression`]: () => json(report),
      [`PUT /api/trees/${treeId}/regression-set`]: (request) => json(request.body),
    });
    renderApp(`/trees/${treeId}/draft/publish`);
    const user = userEvent.setup();
    await user.click(
      await screen.findByRole('button', { name: 'Replay finished cases' }, { timeout: 10_000 }),
    );
    const table = await screen.findByRole('table', {
      name: 'Finished cases replayed against the draft',
    });
    const row = within(table).getAllByRole('row')[1]!;
    expect(row.textContent).toContain('C-00012');
    expect(row.textContent).toContain('Fan stage not switching');
    expect(row.textContent).toContain('Different finding');
    expect(row.textContent).toContain('Thermostat sticking closed');

    await user.click(within(row).getByRole('checkbox', { name: /Guards the tree: C-00012/ }));
    await user.click(screen.getByRole('button', { name: 'Save regression set' }));
    await waitFor(() =>
      expect(requests.find((request) => request.method === 'PUT')?.body).toEqual({
        caseIds: [caseId],
      }),
    );
  });
});

describe('the tree library', () => {
  it('lists each tree with its versions and imports a file, listing every problem', async () => {
    const imported = version({
      id: '00000000-0000-4000-8000-0000000000f9',
      treeId: '00000000-0000-4000-8000-0000000000e9',
      status: 'draft',
      changeNote: null,
      publishedAt: null,
      publishedBy: null,
      caseCount: 0,
      definition: { title: 'Imported tree' },
      problems: [
        {
          code: 'unknown-target',
          message: '"Ask" leads to "nowhere", but there is no node with that id.',
          nodeId: 'ask',
        },
        { code: 'no-outcome', message: 'The tree has no outcome.' },
      ],
    });
    const { requests } = mockApi({
      'GET /api/me': () => json(makeMe()),
      'GET /api/trees': () => json({ trees: [entry()] }),
      'POST /api/trees': () => json({ treeId: imported.treeId, draft: imported }, 201),
    });
    renderApp('/trees');
    const user = userEvent.setup();
    const card = await screen.findByRole('article', { name: 'Hot at idle' }, { timeout: 10_000 });
    const versions = within(card).getByRole('table', { name: 'Versions of Hot at idle' });
    expect(versions.textContent).toContain('Rosa Quell');
    expect(versions.textContent).toContain('First version.');
    expect(versions.textContent).toMatch(/6\s*cases/);
    expect(within(card).getByRole('link', { name: /Edit draft v2/ })).toBeTruthy();

    const file = new File([JSON.stringify({ title: 'Imported tree', nodes: {} })], 'tree.json', {
      type: 'application/json',
    });
    await user.upload(screen.getByLabelText('Import a tree file'), file);
    const problems = await screen.findByRole('list', { name: 'Problems in the imported file' });
    expect(within(problems).getAllByRole('listitem')).toHaveLength(2);
    expect(requests.find((request) => request.method === 'POST')?.body).toEqual({
      mode: 'import',
      definition: { title: 'Imported tree', nodes: {} },
    });
  });

  it('offers Delete only for a tree never published, and deletes it after a confirm', async () => {
    const unpublishedId = '00000000-0000-4000-8000-0000000000ea';
    const onlyDraft = version({
      id: '00000000-0000-4000-8000-0000000000fa',
      treeId: unpublishedId,
      status: 'draft',
      changeNote: null,
      publishedAt: null,
      publishedBy: null,
      caseCount: 0,
    });
    const unpublished = entry({
      id: unpublishedId,
      key: 'fan-runs-on',
      title: 'Fan runs on',
      latestPublished: null,
      draft: onlyDraft,
      versions: [onlyDraft],
    });
    let trees = [entry(), unpublished];
    const { requests } = mockApi({
      'GET /api/me': () => json(makeMe()),
      'GET /api/trees': () => json({ trees }),
      [`DELETE /api/trees/${unpublishedId}`]: () => {
        trees = [entry()];
        return new Response(null, { status: 204 });
      },
    });
    renderApp('/trees');
    const user = userEvent.setup();
    const published = await screen.findByRole(
      'article',
      { name: 'Hot at idle' },
      { timeout: 10_000 },
    );
    expect(within(published).queryByRole('button', { name: /Delete/ })).toBeNull();
    const card = screen.getByRole('article', { name: 'Fan runs on' });
    await user.click(within(card).getByRole('button', { name: /^Delete/ }));
    const confirm = within(card).getByRole('alert');
    expect(confirm.textContent).toContain('never published');
    expect(requests.some((r) => r.method === 'DELETE')).toBe(false);
    await user.click(within(confirm).getByRole('button', { name: /Yes, delete/ }));
    await waitFor(() => expect(screen.queryByRole('article', { name: 'Fan runs on' })).toBeNull());
    expect(requests.filter((r) => r.method === 'DELETE').map((r) => r.path)).toEqual([
      `/api/trees/${unpublishedId}`,
    ]);
  });
});
