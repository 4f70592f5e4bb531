import 'fake-indexeddb/auto';
import type { WalkEvent } from '@heatpath/fault-tree';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { errorResponse, json } from '../../test/api-mock';
import { walkAfter } from '../../test/case-fixtures';
import type { NewOutboxItem, OutboxItem } from './outbox-item';
import { createOutboxSender, signInToSend, type OutboxSender } from './outbox-sender';
import { createOutboxStore, type OutboxStore } from './outbox-store';

const userId = '00000000-0000-4000-8000-000000000002';
const caseA = '00000000-0000-4000-8000-0000000000c1';
const caseB = '00000000-0000-4000-8000-0000000000c2';

interface Received {
  path: string;
  key: string;
  body: Record<string, unknown>;
}

/** A stand-in for the API that stores each idempotency key once, like the real one. */
function fakeServer() {
  const received: Received[] = [];
  const stored: Received[] = [];
  let answer: (request: Received) => Response | Promise<Response> | null = () => null;
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init: RequestInit = {}) => {
    const path = new URL(String(input), 'http://heatpath.test').pathname;
    const body =
      init.body instanceof FormData
        ? Object.fromEntries([...init.body.entries()].map(([k, v]) => [k, String(v)]))
        : (JSON.parse(String(init.body)) as Record<string, unknown>);
    const key = String(body.idempotencyKey);
    const request = { path, key, body };
    received.push(request);
    const special = await answer(request);
    if (special) return special;
    if (!stored.some((known) => known.key === key)) stored.push(request);
    if (path.endsWith('/walk')) return json({ walk: walkAfter([]), repeated: false }, 201);
    return json(
      {
        id: crypto.randomUUID(),
        nodeId: null,
        text: String(body.text),
        author: { id: userId, name: 'Tomas Brand' },
        createdAt: '2025-03-01T09:00:00.000Z',
      },
      201,
    );
  });
  vi.stubGlobal('fetch', fetchMock);
  return {
    received,
    stored,
    respond(handler: typeof answer) {
      answer = handler;
    },
  };
}

function walkItem(caseId: string, position: number): NewOutboxItem {
  const event: WalkEvent = {
    type: 'answer.procedure',
    nodeId: `step-${position}`,
    position,
    result: 'done',
  };
  return {
    kind: 'walk',
    key: crypto.randomUUID(),
    caseId,
    userId,
    createdAt: '2025-03-01T09:00:00.000Z',
    event,
    label: `Answer ${position}`,
  };
}

function noteItem(caseId: string, text: string): NewOutboxItem {
  return {
    kind: 'note',
    key: crypto.randomUUID(),
    caseId,
    userId,
    createdAt: '2025-03-01T09:00:00.000Z',
    text,
    nodeId: null,
  };
}

let databaseCount = 0;
let open: { store: OutboxStore; sender: OutboxSender }[] = [];
let databaseName = '';

function startOutbox(name = databaseName) {
  const store = createOutboxStore(name);
  const sender = createOutboxSender({ store, retryDelaysMs: [1_000, 2_000] });
  open.push({ store, sender });
  return { store, sender };
}

async function sendAll(sender: OutboxSender) {
  sender.setUser(userId);
  sender.kick();
  await sender.settled();
}

const states = (items: readonly OutboxItem[]) => items.map((item) => item.state);

beforeEach(() => {
  databaseCount += 1;
  databaseName = `heatpath-outbox-test-${databaseCount}`;
});

afterEach(() => {
  for (const { store, sender } of open) {
    sender.stop();
    store.close();
  }
  open = [];
  vi.useRealTimers();
  vi.unstubAllGlobals();
});

describe('the outbox', () => {
  it('sends each case’s items in the order they were queued, then forgets them', async () => {
    const server = fakeServer();
    const { store, sender } = startOutbox();
    const queued = [
      walkItem(caseA, 0),
      noteItem(caseA, 'Hose is soft.'),
      walkItem(caseB, 0),
      walkItem(caseA, 1),
      walkItem(caseB, 1),
    ];
    for (const item of queued) await store.add(item);
    await sendAll(sender);

    expect(server.stored.map((r) => r.key)).toEqual(queued.map((item) => item.key));
    const ofCaseA = server.stored.filter((r) => r.path.includes(caseA)).map((r) => r.path);
    expect(ofCaseA.map((path) => path.split('/').pop())).toEqual(['walk', 'notes', 'walk']);
    expect(store.all()).toEqual([]);
  });

  it('keeps the queue through a reload and sends each item exactly once', async () => {
    const server = fakeServer();
    // The first tab's request reaches the server, but the tab is closed before the reply.
    let cutOff = true;
    server.respond(() => (cutOff ? new Promise<Response>(() => undefined) : null));
    const first = startOutbox();
    const queued = [walkItem(caseA, 0), walkItem(caseA, 1), noteItem(caseA, 'Cap replaced.')];
    for (const item of queued) await first.store.add(item);
    first.sender.setUser(userId);
    first.sender.kick();
    await vi.waitFor(() => expect(server.received).toHaveLength(1));
    // The server stored the first answer; its reply is lost with the closed tab.
    server.stored.push(server.received[0] as Received);
    first.sender.stop();
    first.store.close();

    cutOff = false;
    const second = startOutbox();
    await second.store.ready;
    expect(states(second.store.all())).toEqual(['sending', 'waiting', 'waiting']);
    await sendAll(second.sender);

    expect(server.received.map((r) => r.key)).toEqual([
      queued[0]?.key,
      queued[0]?.key,
      queued[1]?.key,
      queued[2]?.key,
    ]);
    expect(server.stored.map((r) => r.key)).toEqual(queued.map((item) => item.key));
    expect(second.store.all()).toEqual([]);
  });

  it('tries again after a network failure with the same idempotency keys', async () => {
    vi.useFakeTimers({ toFake: ['setTimeout', 'clearTimeout'] });
    const server = fakeServer();
    let offline = true;
    server.respond(() => {
      if (offline) throw new TypeError('Failed to fetch');
      return null;
    });
    const { store, sender } = startOutbox();
    const queued = [walkItem(caseA, 0), walkItem(caseA, 1)];
    for (const item of queued) await store.add(item);
    await sendAll(sender);

    expect(server.received).toHaveLength(1);
    expect(sender.status().retrying).toBe(true);
    expect(states(store.all())).toEqual(['waiting', 'waiting']);
    expect(store.all()[0]?.problem).toMatch(/No connection/);

    // Still offline at the first retry: the backoff grows, nothing is dropped.
    vi.advanceTimersByTime(1_000);
    await sender.settled();
    expect(server.received).toHaveLength(2);

    offline = false;
    vi.advanceTimersByTime(2_000);
    await sender.settled();
    expect(server.received.map((r) => r.key)).toEqual([
      queued[0]?.key,
      queued[0]?.key,
      queued[0]?.key,
      queued[1]?.key,
    ]);
    expect(server.stored.map((r) => r.key)).toEqual(queued.map((item) => item.key));
    expect(store.all()).toEqual([]);
    expect(sender.status().retrying).toBe(false);
  });

  it('holds a stale answer (409) and every later answer of the case; notes still go', async () => {
    const server = fakeServer();
    const stale = walkItem(caseA, 1);
    server.respond((request) =>
      request.key === stale.key
        ? errorResponse(409, 'conflict', 'The walk is no longer at this step.')
        : null,
    );
    const { store, sender } = startOutbox();
    const queued = [
      walkItem(caseA, 0),
      stale,
      noteItem(caseA, 'Fan runs.'),
      walkItem(caseA, 2),
      walkItem(caseB, 0),
    ];
    for (const item of queued) await store.add(item);
    await sendAll(sender);

    expect(server.received.map((r) => r.key)).toEqual(
      [queued[0], queued[1], queued[2], queued[4]].map((item) => item?.key),
    );
    const left = store.all();
    expect(left.map((item) => item.key)).toEqual([stale.key, queued[3]?.key]);
    expect(states(left)).toEqual(['held', 'held']);
    expect(left[0]?.problem).toBe('The walk is no longer at this step.');
  });

  it('stops at an ended session and sends again after a sign-in', async () => {
    const server = fakeServer();
    let signedIn = false;
    server.respond(() =>
      signedIn ? null : errorResponse(401, 'unauthenticated', 'Sign in first.'),
    );
    const { store, sender } = startOutbox();
    const queued = [walkItem(caseA, 0), walkItem(caseA, 1)];
    for (const item of queued) await store.add(item);
    await sendAll(sender);

    expect(server.received).toHaveLength(1);
    expect(sender.status().signedOut).toBe(true);
    expect(store.all()[0]?.problem).toBe(signInToSend);
    // Nothing is sent while signed out, even when asked.
    sender.kick();
    await sender.settled();
    expect(server.received).toHaveLength(1);

    signedIn = true;
    sender.signedIn();
    await sender.settled();
    expect(server.stored.map((r) => r.key)).toEqual(queued.map((item) => item.key));
    expect(store.all()).toEqual([]);
  });

  it('marks an item the server refuses (4xx) with its words and keeps it', async () => {
    const server = fakeServer();
    const refused = walkItem(caseA, 0);
    server.respond((request) =>
      request.key === refused.key
        ? errorResponse(
            422,
            'validation_failed',
            'This step needs a photo first: Photo of the test fluid. Add it, then answer.',
          )
        : null,
    );
    const { store, sender } = startOutbox();
    await store.add(refused);
    await store.add(noteItem(caseA, 'Photo to follow.'));
    await sendAll(sender);

    expect(store.all()).toMatchObject([
      {
        key: refused.key,
        state: 'refused',
        problem: 'This step needs a photo first: Photo of the test fluid. Add it, then answer.',
      },
    ]);
    expect(server.stored).toHaveLength(1);
  });

  it('sends only the signed-in person’s items', async () => {
    const server = fakeServer();
    const { store, sender } = startOutbox();
    await store.add({ ...walkItem(caseA, 0), userId: '00000000-0000-4000-8000-000000000009' });
    await sendAll(sender);
    expect(server.received).toHaveLength(0);
    expect(states(store.all())).toEqual(['waiting']);
  });
});
