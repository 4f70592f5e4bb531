// The queue itself: items in IndexedDB and a copy in memory that screens read synchronously
// (useSyncExternalStore). Writes go one after another, so items get their `seq` in the order they
// were queued. Other tabs hear of each change over a BroadcastChannel and read the queue again.
// Without IndexedDB (a locked-down browser) the queue still works, in memory only.
import { openOutboxDatabase, outboxDatabaseName, type OutboxDatabase } from './outbox-db';
import type { NewOutboxItem, OutboxItem, OutboxState } from './outbox-item';

export interface OutboxStore {
  /** Settles once the queue kept on this device has been read. */
  readonly ready: Promise<void>;
  isReady(): boolean;
  /** Every item, oldest first. */
  all(): readonly OutboxItem[];
  /** One case's items, oldest first; the same array until that case's items change. */
  forCase(caseId: string): readonly OutboxItem[];
  subscribe(listener: () => void): () => void;
  add(item: NewOutboxItem): Promise<OutboxItem>;
  update(seq: number, patch: { state: OutboxState; problem: string | null }): Promise<void>;
  /** Several items at once, seen by the screens as one change. */
  updateMany(
    seqs: readonly number[],
    patch: { state: OutboxState; problem: string | null },
  ): Promise<void>;
  remove(seq: number): Promise<void>;
  /** Reads the queue again from IndexedDB (another tab may have changed it). */
  reload(): Promise<void>;
  close(): void;
}

const noItems: readonly OutboxItem[] = [];

export function createOutboxStore(name = outboxDatabaseName): OutboxStore {
  let database: OutboxDatabase | null = null;
  let items: OutboxItem[] = [];
  let byCase = new Map<string, readonly OutboxItem[]>();
  let ready = false;
  let memorySeq = 0;
  const listeners = new Set<() => void>();
  const channel =
    typeof BroadcastChannel === 'function' ? new BroadcastChannel(`${name}-changes`) : null;

  const publish = (next: OutboxItem[], fromHere: boolean) => {
    items = next.sort((a, b) => a.seq - b.seq);
    const grouped = new Map<string, OutboxItem[]>();
    for (const item of items) {
      const list = grouped.get(item.caseId) ?? [];
      list.push(item);
      grouped.set(item.caseId, list);
    }
    // Keep a case's array when nothing in it changed, so its screens do not render again.
    const previous = byCase;
    byCase = new Map(
      [...grouped].map(([caseId, list]) => {
        const old = previous.get(caseId);
        const same = old?.length === list.length && old.every((item, i) => item === list[i]);
        return [caseId, same && old ? old : list];
      }),
    );
    if (fromHere) channel?.postMessage('changed');
    for (const listener of listeners) listener();
  };

  // One write at a time, in call order.
  let chain: Promise<unknown> = Promise.resolve();
  const serial = <T>(work: () => Promise<T>): Promise<T> => {
    const next = chain.then(work);
    chain = next.catch(() => undefined);
    return next;
  };

  const readAll = async () => (database ? database.getAll('items') : items);

  const readyPromise = serial(async () => {
    try {
      database = await openOutboxDatabase(name);
    } catch {
      database = null;
    }
    publish(await readAll(), false);
    ready = true;
  });

  if (channel) channel.onmessage = () => void store.reload();

  const store: OutboxStore = {
    ready: readyPromise,
    isReady: () => ready,
    all: () => items,
    forCase: (caseId) => byCase.get(caseId) ?? noItems,
    subscribe(listener) {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
    add: (draft) =>
      serial(async () => {
        const queued = { ...draft, state: 'waiting', problem: null } as Omit<OutboxItem, 'seq'>;
        let seq: number;
        if (database) {
          seq = await database.add('items', queued as OutboxItem);
        } else {
          memorySeq = Math.max(memorySeq, ...items.map((item) => item.seq)) + 1;
          seq = memorySeq;
        }
        const item = { ...queued, seq } as OutboxItem;
        publish([...items.filter((other) => other.seq !== seq), item], true);
        return item;
      }),
    update: (seq, patch) => store.updateMany([seq], patch),
    updateMany: (seqs, patch) =>
      serial(async () => {
        const changed: OutboxItem[] = [];
        const transaction = database?.transaction('items', 'readwrite');
        for (const seq of seqs) {
          const stored = transaction ? await transaction.store.get(seq) : undefined;
          const current = stored ?? items.find((item) => item.seq === seq);
          if (!current) continue;
          const next = { ...current, ...patch };
          if (transaction) await transaction.store.put(next);
          changed.push(next);
        }
        await transaction?.done;
        if (changed.length === 0) return;
        const bySeq = new Set(changed.map((item) => item.seq));
        publish([...items.filter((item) => !bySeq.has(item.seq)), ...changed], true);
      }),
    remove: (seq) =>
      serial(async () => {
        if (database) await database.delete('items', seq);
        publish(
          items.filter((item) => item.seq !== seq),
          true,
        );
      }),
    reload: () =>
      serial(async () => {
        if (database) publish(await database.getAll('items'), false);
      }),
    close() {
      channel?.close();
      database?.close();
      listeners.clear();
    },
  };
  return store;
}
