import 'fake-indexeddb/auto';
import type { CaseDetail, Me } from '@heatpath/contracts';
import { cleanup, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { resetOutboxForTests } from '../../../lib/outbox';
import { createOutboxStore } from '../../../lib/outbox/outbox-store';
import { errorResponse, json, makeMe, mockApi, type RecordedRequest } from '../../../test/api-mock';
import {
  caseId,
  eventsFor,
  makeCaseDetail,
  makeFindings,
  paths,
  walkAfter,
  walkOf,
} from '../../../test/case-fixtures';
import { renderApp } from '../../../test/render-app';

afterEach(async () => {
  cleanup();
  await resetOutboxForTests();
  vi.unstubAllGlobals();
  window.localStorage.clear();
});

const technician = makeMe({ role: 'technician' });

// The case page is a lazy chunk with the fault-tree package (XState, mathjs); the first render of
// a test file may wait for it.
const slow = { timeout: 8000 };

interface Setup {
  me?: Me;
  detail: CaseDetail;
  walk?: (request: RecordedRequest, attempt: number) => Response | Promise<Response>;
}

function setup({ me = technician, detail, walk }: Setup) {
  let current = detail;
  let attempts = 0;
  const api = mockApi({
    'GET /api/me': () => json(me),
    [`GET /api/cases/${caseId}`]: () => json(current),
    [`GET /api/cases/${caseId}/events`]: () => json({ events: [] }),
    [`POST /api/cases/${caseId}/notes`]: (request) =>
      json(
        {
          id: crypto.randomUUID(),
          nodeId: (request.body as { nodeId: string | null }).nodeId,
          text: (request.body as { text: string }).text,
          author: { id: me.id, name: me.name },
          createdAt: '2025-03-01T09:00:00.000Z',
        },
        201,
      ),
    [`POST /api/cases/${caseId}/walk`]: async (request) => {
      attempts += 1;
      const response = walk
        ? await walk(request, attempts)
        : errorResponse(500, 'internal', 'No handler.');
      // Like the API, a stored answer changes what the case reads as from then on.
      if (response.ok) {
        const body = (await response.clone().json()) as { walk: CaseDetail['walk'] };
        current = { ...current, walk: body.walk };
      }
      return response;
    },
  });
  renderApp(`/cases/${caseId}`);
  return {
    ...api,
    walkRequests: () => api.requests.filter((r) => r.method === 'POST' && r.path.endsWith('/walk')),
    noteRequests: () =>
      api.requests.filter((r) => r.method === 'POST' && r.path.endsWith('/notes')),
    caseReads: () =>
      api.requests.filter((r) => r.method === 'GET' && r.path === `/api/cases/${caseId}`),
    setCase: (next: CaseDetail) => {
      current = next;
    },
  };
}

describe('the case page', () => {
  it('shows a step’s cautions before its instruction', async () => {
    setup({ detail: makeCaseDetail(paths.blockTest) });
    await screen.findByRole('heading', { level: 2, name: 'Block test for combustion gas' }, slow);
    const cautions = screen.getByTestId('step-cautions');
    const instruction = screen.getByTestId('step-instruction');
    expect(
      cautions.compareDocumentPosition(instruction) & Node.DOCUMENT_POSITION_FOLLOWING,
    ).toBeTruthy();
    expect(within(cautions).getByText('Caution')).toBeTruthy();
    expect(within(cautions).getByText(/only on a cold system/)).toBeTruthy();
    expect(within(cautions).getByText(/fan can start without warning/)).toBeTruthy();
    expect(within(cautions).getByText(/Coolant is poisonous and tastes sweet/)).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Done' })).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Could not do' })).toBeTruthy();
  });

  it('converts readings typed in °F, works them out live and sends them as entered', async () => {
    const { walkRequests } = setup({
      detail: makeCaseDetail(paths.hoseTemps),
      walk: () =>
        json(
          {
            walk: walkAfter([
              ...paths.hoseTemps,
              {
                engineTempAtHoses: { value: 105, unit: 'degC' },
                radiatorInletTemp: { value: 167, unit: 'degF' },
                radiatorOutletTemp: { value: 158, unit: 'degF' },
              },
            ]),
            repeated: false,
          },
          201,
        ),
    });
    const user = userEvent.setup();
    await screen.findByRole('heading', { level: 2, name: 'Radiator hose temperatures' }, slow);
    await user.selectOptions(screen.getByLabelText('Unit for Radiator inlet hose'), 'degF');
    await user.selectOptions(screen.getByLabelText('Unit for Radiator outlet hose'), 'degF');
    await user.type(screen.getByLabelText('Live data at the moment of the hose readings'), '105');
    await user.type(screen.getByLabelText('Radiator inlet hose'), '167');
    await user.type(screen.getByLabelText('Radiator outlet hose'), '158');

    const live = screen.getByRole('region', { name: 'Worked out as you type' });
    // 167 °F is 75 °C and 158 °F is 70 °C: a 5 K drop, shown as 9 °F because °F was typed.
    expect(within(live).getByText('9 °F (5 K)')).toBeTruthy();
    // Live data read 105 °C at the same moment: the inlet hose is 30 K cooler, so the next step
    // asks whether coolant moves through the engine at all.
    expect(within(live).getByText('30 K', { exact: false })).toBeTruthy();
    expect(within(live).getByText('Does coolant move through the engine?')).toBeTruthy();
    // The range is shown in the unit being typed.
    expect(screen.getAllByText('Allowed −40 to 302 °F')).toHaveLength(2);

    await user.click(screen.getByRole('button', { name: 'Save readings' }));
    expect(
      await screen.findByRole('heading', {
        level: 2,
        name: 'Does coolant move through the engine?',
      }),
    ).toBeTruthy();
    await waitFor(() => expect(walkRequests()).toHaveLength(1));
    const sent = walkRequests()[0]?.body as { event: Record<string, unknown> };
    expect(sent.event).toMatchObject({
      type: 'answer.measurement',
      nodeId: 'hose-temps',
      readings: {
        engineTempAtHoses: { value: 105, unit: 'degC' },
        radiatorInletTemp: { value: 167, unit: 'degF' },
        radiatorOutletTemp: { value: 158, unit: 'degF' },
      },
    });
  });

  it('flags a reading outside its range under the box, before anything is sent', async () => {
    const { walkRequests } = setup({ detail: makeCaseDetail(paths.hoseTemps) });
    const user = userEvent.setup();
    await screen.findByRole('heading', { level: 2, name: 'Radiator hose temperatures' }, slow);
    const inlet = screen.getByLabelText('Radiator inlet hose');
    await user.type(inlet, '180');
    expect(inlet.getAttribute('aria-invalid')).toBe('true');
    expect(
      screen.getByText(/must be between −?-?40 and 150 °C; 180 °C is outside it/),
    ).toBeTruthy();
    await user.type(screen.getByLabelText('Radiator outlet hose'), '70');
    await user.click(screen.getByRole('button', { name: 'Save readings' }));
    expect(walkRequests()).toHaveLength(0);
  });

  it('shows the next step at once and takes what changed from the server’s reply', async () => {
    let reply: (response: Response) => void = () => undefined;
    const { walkRequests, caseReads } = setup({
      detail: makeCaseDetail(paths.start),
      walk: () =>
        new Promise<Response>((resolve) => {
          reply = resolve;
        }),
    });
    const user = userEvent.setup();
    await screen.findByRole('heading', { level: 2, name: 'When does it run hot?' }, slow);
    const readsBefore = caseReads().length;
    await user.click(
      screen.getByRole('button', { name: 'At idle or in slow traffic; fine at speed' }),
    );
    // The tablet walks the tree itself: the next step is there before the server has replied.
    expect(
      screen.getByRole('heading', { level: 2, name: 'Coolant level, engine cold' }),
    ).toBeTruthy();
    expect(await screen.findByText('Sending 1 answer…')).toBeTruthy();
    await waitFor(() => expect(walkRequests()).toHaveLength(1));

    reply(
      json(
        {
          walk: walkAfter(['idle-or-traffic']),
          repeated: false,
          case: {
            status: 'in_diagnosis',
            updatedAt: '2025-03-01T09:05:00.000Z',
            diagnosedAt: null,
            can: { walk: true, editFindings: true, markDiagnosed: false },
            findings: null,
          },
        },
        201,
      ),
    );
    expect(await screen.findByText('All answers saved.')).toBeTruthy();
    // The reply carried what changed: the case is not read again.
    expect(caseReads().length).toBe(readsBefore);
    expect(screen.getByText('In diagnosis')).toBeTruthy();
    expect(
      screen.getByRole('heading', { level: 2, name: 'Coolant level, engine cold' }),
    ).toBeTruthy();
  });

  it('keeps answers lost to the network and sends them later with their idempotency keys', async () => {
    let offline = true;
    const answers = ['idle-or-traffic', { topUpLitres: { value: 0.3, unit: 'L' } }];
    const { walkRequests } = setup({
      detail: makeCaseDetail(paths.start),
      walk: (request) => {
        if (offline) throw new TypeError('Failed to fetch');
        const { event } = request.body as { event: { position: number } };
        return json(
          { walk: walkAfter(answers.slice(0, event.position + 1)), repeated: false },
          201,
        );
      },
    });
    const user = userEvent.setup();
    await screen.findByRole('heading', { level: 2, name: 'When does it run hot?' }, slow);
    await user.click(
      screen.getByRole('button', { name: 'At idle or in slow traffic; fine at speed' }),
    );
    await user.type(screen.getByLabelText('Coolant added to reach MAX'), '0.3');
    await user.click(screen.getByRole('button', { name: 'Save reading' }));
    expect(await screen.findByRole('heading', { level: 2, name: 'Look for leaks' })).toBeTruthy();
    expect(await screen.findByText('2 answers wait for the network.')).toBeTruthy();

    offline = false;
    await user.click(screen.getByRole('button', { name: 'Send now' }));
    expect(await screen.findByText('All answers saved.')).toBeTruthy();
    const keys = walkRequests().map((r) => (r.body as { idempotencyKey: string }).idempotencyKey);
    const [first] = keys;
    expect(first).toMatch(/^[0-9a-f-]{36}$/);
    // Tried offline, then sent again with the same key; the second answer only after it.
    expect(keys.filter((key) => key === first).length).toBeGreaterThanOrEqual(2);
    expect(new Set(keys).size).toBe(2);
    expect(keys.at(-1)).not.toBe(first);
    expect(screen.getByRole('heading', { level: 2, name: 'Look for leaks' })).toBeTruthy();
  });

  it('sends an answer kept on the tablet from before a reload, by itself', async () => {
    const kept = createOutboxStore();
    await kept.add({
      kind: 'walk',
      key: '11111111-2222-4333-8444-555555555555',
      caseId,
      userId: technician.id,
      createdAt: '2025-03-01T09:00:00.000Z',
      event: {
        type: 'answer.choice',
        nodeId: 'interview-pattern',
        position: 0,
        choiceId: 'no-pattern',
      },
      label: 'No clear pattern',
    });
    kept.close();
    const { walkRequests } = setup({
      detail: makeCaseDetail(paths.start),
      walk: () => json({ walk: walkAfter(['no-pattern']), repeated: false }, 201),
    });
    // The kept answer is part of the walk on this tablet from the start.
    expect(
      await screen.findByRole('heading', { level: 2, name: 'Coolant level, engine cold' }, slow),
    ).toBeTruthy();
    await waitFor(() => expect(walkRequests()).toHaveLength(1));
    expect((walkRequests()[0]?.body as { idempotencyKey: string }).idempotencyKey).toBe(
      '11111111-2222-4333-8444-555555555555',
    );
  });

  it('holds answers the case moved on from (409) and can keep them as a note', async () => {
    const moved = makeCaseDetail(['speed-or-load']);
    const { setCase, noteRequests } = setup({
      detail: makeCaseDetail(paths.start),
      walk: () => {
        setCase(moved);
        return errorResponse(409, 'conflict', 'The walk is no longer at this step.');
      },
    });
    const user = userEvent.setup();
    await screen.findByRole('heading', { level: 2, name: 'When does it run hot?' }, slow);
    await user.click(screen.getByRole('button', { name: 'No clear pattern' }));

    // The page shows where the case stands: answered elsewhere, "At speed".
    expect(await screen.findByText('At speed, uphill or towing')).toBeTruthy();
    expect(
      screen.getByRole('heading', { level: 2, name: 'Coolant level, engine cold' }),
    ).toBeTruthy();
    const panel = await screen.findByRole('region', { name: /moved on/ });
    expect(within(panel).getByText('The case moved on before these answers arrived')).toBeTruthy();
    expect(within(panel).getByText('When does it run hot?: No clear pattern')).toBeTruthy();

    await user.click(within(panel).getByRole('button', { name: 'Keep the case as it is' }));
    await waitFor(() => expect(noteRequests()).toHaveLength(1));
    expect((noteRequests()[0]?.body as { text: string }).text).toContain(
      'When does it run hot?: No clear pattern',
    );
    await waitFor(() =>
      expect(screen.queryByText('The case moved on before these answers arrived')).toBeNull(),
    );
  });

  it('answers held answers again from where the case stands, with their readings filled in', async () => {
    const moved = makeCaseDetail(['idle-or-traffic']);
    let open: () => void = () => undefined;
    const offline = new Promise<void>((resolve) => {
      open = resolve;
    });
    const { setCase } = setup({
      detail: makeCaseDetail(paths.start),
      // Both answers are given before the network returns; by then the case has moved on.
      walk: async () => {
        await offline;
        setCase(moved);
        return errorResponse(409, 'conflict', 'The walk is no longer at this step.');
      },
    });
    const user = userEvent.setup();
    await screen.findByRole('heading', { level: 2, name: 'When does it run hot?' }, slow);
    await user.click(screen.getByRole('button', { name: 'At speed, uphill or towing' }));
    await user.type(screen.getByLabelText('Coolant added to reach MAX'), '0.35');
    await user.click(screen.getByRole('button', { name: 'Save reading' }));
    await screen.findByRole('heading', { level: 2, name: 'Look for leaks' });
    open();

    // The page shows where the case stands (answered elsewhere), then the held answers.
    expect(await screen.findByText('At idle or in slow traffic; fine at speed')).toBeTruthy();
    await waitFor(() =>
      expect(
        within(screen.getByRole('region', { name: /moved on/ })).getAllByRole('listitem'),
      ).toHaveLength(2),
    );
    await user.click(
      screen.getByRole('button', { name: 'Answer again from where the case stands' }),
    );
    await waitFor(() => expect(screen.queryByRole('region', { name: /moved on/ })).toBeNull());
    expect(
      screen.getByRole('heading', { level: 2, name: 'Coolant level, engine cold' }),
    ).toBeTruthy();
    expect((screen.getByLabelText('Coolant added to reach MAX') as HTMLInputElement).value).toBe(
      '0.35',
    );
  });

  it('keeps answers when the session has ended and asks to sign in before sending', async () => {
    setup({
      detail: makeCaseDetail(paths.start),
      walk: () => errorResponse(401, 'unauthenticated', 'Sign in first.'),
    });
    const user = userEvent.setup();
    await screen.findByRole('heading', { level: 2, name: 'When does it run hot?' }, slow);
    await user.click(screen.getByRole('button', { name: 'No clear pattern' }));
    // The walk goes on; the answer waits on the tablet for a new session.
    expect(
      screen.getByRole('heading', { level: 2, name: 'Coolant level, engine cold' }),
    ).toBeTruthy();
    const alert = (await screen.findByText('Sign in again to send')).closest(
      '[role="alert"]',
    ) as HTMLElement;
    expect(within(alert).getByText(/1 answer waits on this tablet/)).toBeTruthy();
    expect(within(alert).getByRole('link', { name: 'Sign in' })).toBeTruthy();
  });

  it('steps back with an event, not by forgetting the answer', async () => {
    const { walkRequests } = setup({
      detail: makeCaseDetail(['idle-or-traffic']),
      // Back at the start, with both events in the history.
      walk: () =>
        json(
          {
            walk: walkOf([
              ...eventsFor(['idle-or-traffic']),
              { type: 'walk.back', nodeId: 'level-cold', position: 1 },
            ]),
            repeated: false,
          },
          201,
        ),
    });
    const user = userEvent.setup();
    await screen.findByRole('heading', { level: 2, name: 'Coolant level, engine cold' }, slow);
    await user.click(screen.getByRole('button', { name: 'Step back' }));
    expect(
      await screen.findByRole('heading', { level: 2, name: 'When does it run hot?' }),
    ).toBeTruthy();
    await waitFor(() => expect(walkRequests()).toHaveLength(1));
    expect(walkRequests()[0]?.body).toMatchObject({
      event: { type: 'walk.back', nodeId: 'level-cold', position: 1 },
    });
  });

  it('puts the readings a step back undoes into the boxes again', async () => {
    const answered = ['idle-or-traffic', { topUpLitres: { value: 0.3, unit: 'L' } }];
    setup({
      detail: makeCaseDetail(answered),
      walk: () =>
        json(
          {
            walk: walkOf([
              ...eventsFor(answered),
              { type: 'walk.back', nodeId: 'visual-leaks', position: 2 },
            ]),
            repeated: false,
          },
          201,
        ),
    });
    const user = userEvent.setup();
    await screen.findByRole('heading', { level: 2, name: 'Look for leaks' }, slow);
    await user.click(screen.getByRole('button', { name: 'Step back' }));
    await screen.findByRole('heading', { level: 2, name: 'Coolant level, engine cold' });
    expect((screen.getByLabelText('Coolant added to reach MAX') as HTMLInputElement).value).toBe(
      '0.3',
    );
  });

  it('shows a finding reached on the tablet before its findings, then the findings from the reply', async () => {
    const beforeLast = paths.outcome.slice(0, -1);
    let reply: (response: Response) => void = () => undefined;
    const { caseReads, walkRequests } = setup({
      detail: makeCaseDetail(beforeLast),
      walk: () =>
        new Promise<Response>((resolve) => {
          reply = resolve;
        }),
    });
    const user = userEvent.setup();
    await screen.findByRole('heading', { level: 2, name: 'Thermostat opening temperature' }, slow);
    await user.type(screen.getByLabelText('Stamped opening temperature'), '87');
    await user.type(screen.getByLabelText('Water temperature when it began to open'), '99');
    await user.click(screen.getByRole('button', { name: 'Save readings' }));
    expect(
      await screen.findByRole('heading', { level: 2, name: 'Thermostat sticking closed' }),
    ).toBeTruthy();
    expect(
      screen.getByText('The findings are drafted when the answers reach the workshop.'),
    ).toBeTruthy();
    const readsBefore = caseReads().length;
    await waitFor(() => expect(walkRequests()).toHaveLength(1));

    reply(
      json(
        {
          walk: walkAfter(paths.outcome),
          repeated: false,
          case: {
            status: 'in_diagnosis',
            updatedAt: '2025-03-01T09:05:00.000Z',
            diagnosedAt: null,
            can: { walk: true, editFindings: true, markDiagnosed: true },
            findings: makeFindings(),
          },
        },
        201,
      ),
    );
    expect(
      await screen.findByRole('heading', { level: 2, name: 'Findings for the repair order' }),
    ).toBeTruthy();
    expect(caseReads().length).toBe(readsBefore);
  });

  it('stores a procedure’s note on its step before the answer', async () => {
    const { requests } = setup({
      detail: makeCaseDetail(paths.blockTest),
      walk: () => json({ walk: walkAfter([...paths.blockTest, 'done']), repeated: false }, 201),
    });
    mockNotes(requests);
    const user = userEvent.setup();
    await screen.findByRole('heading', { level: 2, name: 'Block test for combustion gas' }, slow);
    await user.click(screen.getByRole('button', { name: 'Add a note' }));
    await user.type(screen.getByLabelText('Note on this step (optional)'), 'Fluid stayed blue.');
    await user.click(screen.getByRole('button', { name: 'Done' }));
    expect(
      await screen.findByRole('heading', { level: 2, name: 'Block test result' }),
    ).toBeTruthy();
    const posted = () =>
      requests.filter((r) => r.method === 'POST').map((r) => r.path.split('/').pop());
    await waitFor(() => expect(posted()).toEqual(['notes', 'walk']));
    expect(requests.find((r) => r.path.endsWith('/notes'))?.body).toMatchObject({
      nodeId: 'block-test',
      text: 'Fluid stayed blue.',
    });
  });

  it('asks for the required photo before the step is answered, then sends the photo first', async () => {
    const atResult = [...paths.blockTest, 'done'];
    const { requests } = setup({
      detail: makeCaseDetail(atResult),
      walk: () => json({ walk: walkAfter([...atResult, 'no-gas']), repeated: false }, 201),
    });
    const fetchMock = vi.mocked(fetch);
    const original = fetchMock.getMockImplementation();
    let sent: { form: FormData; headers: Headers } | null = null;
    fetchMock.mockImplementation(async (input, init) => {
      if (init?.body instanceof FormData) {
        sent = { form: init.body, headers: new Headers(init.headers) };
        requests.push({
          method: 'POST',
          path: new URL(String(input), 'http://heatpath.test').pathname,
          headers: {},
          body: undefined,
          credentials: init.credentials,
        });
        return json(
          {
            id: '00000000-0000-4000-8000-0000000000b7',
            nodeId: 'block-test-result',
            kind: 'photo',
            name: 'fluid.jpg',
            mediaType: 'image/jpeg',
            byteSize: 3,
            width: 10,
            height: 10,
            url: '/api/cases/x/attachments/y/file',
            thumbnailUrl: '/api/cases/x/attachments/y/thumbnail',
            uploadedBy: { id: technician.id, name: technician.name },
            createdAt: '2025-03-01T09:00:00.000Z',
          },
          201,
        );
      }
      return original ? original(input, init) : errorResponse(500, 'internal', 'x');
    });
    const user = userEvent.setup();
    await screen.findByRole('heading', { level: 2, name: 'Block test result' }, slow);
    expect(screen.getByText('Photo of the test fluid')).toBeTruthy();
    expect(screen.getByText('Required')).toBeTruthy();
    const noChange = () => screen.getByRole('button', { name: 'No change' }) as HTMLButtonElement;
    expect(noChange().disabled).toBe(true);
    expect(
      screen.getByText(
        'This step needs a photo first: Photo of the test fluid. Add it, then answer.',
      ),
    ).toBeTruthy();
    const picker = screen.getByLabelText('Attach photo: choose the file') as HTMLInputElement;
    expect(picker.accept).toBe('image/*');
    expect(picker.getAttribute('capture')).toBe('environment');

    await user.upload(picker, new File(['jpg'], 'fluid.jpg', { type: 'image/jpeg' }));
    // The photo shows at once, waiting to be sent, and the step can be answered.
    expect(await screen.findByText('Kept fluid.jpg')).toBeTruthy();
    await waitFor(() => expect(noChange().disabled).toBe(false));
    await user.click(noChange());
    expect(
      await screen.findByRole('heading', { level: 2, name: 'Warm up with live data' }),
    ).toBeTruthy();

    const posted = () =>
      requests.filter((r) => r.method === 'POST').map((r) => r.path.split('/').pop());
    await waitFor(() => expect(posted()).toEqual(['attachments', 'walk']));
    const upload = sent as { form: FormData; headers: Headers } | null;
    expect(upload?.form.get('nodeId')).toBe('block-test-result');
    expect(upload?.form.get('photoOnly')).toBe('true');
    expect(String(upload?.form.get('idempotencyKey'))).toMatch(/^[0-9a-f-]{36}$/);
    expect((upload?.form.get('file') as File | null)?.name).toBe('fluid.jpg');
    expect(upload?.headers.get('x-heatpath-client')).toBe('web');
    expect(upload?.headers.get('content-type')).toBeNull();
  });

  it('saves edited findings against their revision and offers a reload on a conflict', async () => {
    const detail = makeCaseDetail(paths.outcome, {
      findings: makeFindings(),
      can: { walk: true, editFindings: true, markDiagnosed: true },
    });
    setup({ detail });
    const saves: unknown[] = [];
    const fetchMock = vi.mocked(fetch);
    const original = fetchMock.getMockImplementation();
    fetchMock.mockImplementation(async (input, init) => {
      if (init?.method === 'PUT') {
        saves.push(JSON.parse(String(init.body)));
        return errorResponse(
          409,
          'conflict',
          'Someone saved these findings after you opened them.',
        );
      }
      return original ? original(input, init) : errorResponse(500, 'internal', 'x');
    });
    const user = userEvent.setup();
    await screen.findByRole('heading', { level: 2, name: 'Thermostat sticking closed' }, slow);
    const correction = screen.getByLabelText('Correction');
    await user.clear(correction);
    await user.type(correction, 'Fit a new thermostat.');
    await user.type(screen.getByLabelText('Part number of part 1'), 'TH-4471');
    // Unsaved edits must be saved before the case is marked diagnosed.
    expect(
      (screen.getByRole('button', { name: 'Mark diagnosed' }) as HTMLButtonElement).disabled,
    ).toBe(true);
    await user.click(screen.getByRole('button', { name: 'Save findings' }));

    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('Someone else saved these findings');
    expect(within(alert).getByRole('button', { name: 'Reload findings' })).toBeTruthy();
    expect(saves[0]).toMatchObject({
      revision: 1,
      correction: 'Fit a new thermostat.',
      parts: [{ description: 'Thermostat with seal', quantity: 1, partNumber: 'TH-4471' }],
      followUps: ['Recheck the level after the first drive.'],
    });
  });

  it('shows the advisor the findings and no controls that change the case', async () => {
    setup({
      me: makeMe({ role: 'advisor' }),
      detail: makeCaseDetail(paths.outcome, {
        status: 'diagnosed',
        diagnosedAt: '2025-03-01T10:00:00.000Z',
        findings: makeFindings({ correction: 'Fit a new thermostat and seal.' }),
        can: { walk: false, editFindings: false, markDiagnosed: false },
      }),
    });
    const findings = await screen.findByRole('region', { name: /^Findings/ }, slow);
    expect(within(findings).getByText('Fit a new thermostat and seal.')).toBeTruthy();
    expect(within(findings).getByText(/Diagnosed/)).toBeTruthy();
    for (const name of [
      'Step back',
      'Save findings',
      'Mark diagnosed',
      'Add note',
      'Attach file',
    ]) {
      expect(screen.queryByRole('button', { name })).toBeNull();
    }
  });

  it('turns an apprentice away from a live case', async () => {
    mockApi({ 'GET /api/me': () => json(makeMe({ role: 'apprentice' })) });
    renderApp(`/cases/${caseId}`);
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Not open to your role' }, slow),
    ).toBeTruthy();
  });
});

function mockNotes(requests: RecordedRequest[]) {
  const fetchMock = vi.mocked(fetch);
  const original = fetchMock.getMockImplementation();
  fetchMock.mockImplementation(async (input, init) => {
    const url = String(input);
    if (init?.method === 'POST' && url.endsWith('/notes')) {
      const body: unknown = JSON.parse(String(init.body));
      requests.push({
        method: 'POST',
        path: new URL(url, 'http://heatpath.test').pathname,
        headers: {},
        body,
        credentials: init.credentials,
      });
      return json(
        {
          id: '00000000-0000-4000-8000-0000000000b1',
          nodeId: 'block-test',
          text: 'Fluid stayed blue.',
          author: { id: technician.id, name: technician.name },
          createdAt: '2025-03-01T09:00:00.000Z',
        },
        201,
      );
    }
    return original ? original(input, init) : errorResponse(500, 'internal', 'x');
  });
}
