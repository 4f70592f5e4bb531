// The tablet's one outbox: the queue kept in IndexedDB ("heatpath-outbox") and its sender. The
// case page queues answers, notes and photos here and shows them at once; the sender delivers
// them in order and writes the server's replies into the query cache. Signing out does not empty
// it: what was typed is still sent once the same person signs in again.
import type { QueryClient } from '@tanstack/react-query';
import { meQueryKey } from '../auth';
import { casesKeys } from '../query-keys';
import { applyDelivery } from './apply-delivery';
import { isPending, type NewOutboxItem, type OutboxItem } from './outbox-item';
import { createOutboxSender, type OutboxSender } from './outbox-sender';
import { createOutboxStore, type OutboxStore } from './outbox-store';

let store: OutboxStore | null = null;
let sender: OutboxSender | null = null;
let currentUserId: string | null = null;
let connected: { queryClient: QueryClient; unsubscribe: () => void } | null = null;

export function outboxStore(): OutboxStore {
  store ??= createOutboxStore();
  return store;
}

export function outboxSender(): OutboxSender {
  sender ??= createOutboxSender({ store: outboxStore() });
  return sender;
}

/**
 * Connects the outbox to the app's query client and the signed-in person: replies update the
 * cache, a held answer has the case read again, and a sign-in resumes sending. Idempotent.
 */
export function connectOutbox(queryClient: QueryClient, userId: string): void {
  currentUserId = userId;
  const send = outboxSender();
  if (connected?.queryClient !== queryClient) {
    connected?.unsubscribe();
    send.setHandlers({
      onDelivered: (delivery) => {
        applyDelivery(queryClient, delivery);
        const { caseId } = delivery.item;
        // The history panel is read again once the case's queue is empty, not after every answer.
        const left = outboxStore()
          .forCase(caseId)
          .filter((item) => isPending(item) && item.seq !== delivery.item.seq);
        if (left.length === 0) {
          void queryClient.invalidateQueries({ queryKey: casesKeys.events(caseId) });
        }
      },
      onHeld: (caseId) => {
        void queryClient.invalidateQueries({ queryKey: casesKeys.detail(caseId), exact: true });
      },
    });
    const unsubscribe = queryClient.getQueryCache().subscribe((event) => {
      if (
        event.type === 'updated' &&
        event.action.type === 'success' &&
        event.query.queryKey[0] === meQueryKey[0]
      ) {
        send.signedIn();
      }
    });
    connected = { queryClient, unsubscribe };
  }
  send.setUser(userId);
}

type Queued<T extends NewOutboxItem['kind']> = Omit<
  Extract<NewOutboxItem, { kind: T }>,
  'key' | 'userId' | 'createdAt' | 'kind'
> & { key?: string };

function queue(item: NewOutboxItem): Promise<OutboxItem> {
  const added = outboxStore().add(item);
  void added.then(() => outboxSender().kick());
  return added;
}

function base(key?: string) {
  if (currentUserId === null) throw new Error('The outbox is used before anyone signed in.');
  return {
    key: key ?? crypto.randomUUID(),
    userId: currentUserId,
    createdAt: new Date().toISOString(),
  };
}

export function newOutboxKey(): string {
  return crypto.randomUUID();
}

export function enqueueWalk({ key, ...item }: Queued<'walk'>): Promise<OutboxItem> {
  return queue({ ...item, ...base(key), kind: 'walk' });
}

export function enqueueNote({ key, ...item }: Queued<'note'>): Promise<OutboxItem> {
  return queue({ ...item, ...base(key), kind: 'note' });
}

export async function enqueuePhoto({
  caseId,
  nodeId,
  file,
}: {
  caseId: string;
  nodeId: string | null;
  file: File;
}): Promise<void> {
  const bytes = await file.arrayBuffer();
  await queue({
    ...base(),
    kind: 'photo',
    caseId,
    nodeId,
    bytes,
    mediaType: file.type || 'application/octet-stream',
    name: file.name,
  });
}

/** Removes an item the person chose to give up (a refused one, or held answers dealt with). */
export function discardOutboxItem(seq: number): Promise<void> {
  return outboxStore().remove(seq);
}

/**
 * Holds answers the case can no longer take (the server's walk moved on past them): they wait
 * for the person to choose, like answers the server refused as stale.
 */
export async function holdOutboxItems(seqs: readonly number[], problem: string): Promise<void> {
  await outboxStore().updateMany(seqs, { state: 'held', problem });
}

/** Tests only: forget the queue and the sender, so the next test starts with none. */
export async function resetOutboxForTests(): Promise<void> {
  sender?.stop();
  const current = store;
  if (current) {
    await current.ready;
    for (const item of current.all()) await current.remove(item.seq);
    current.close();
  }
  connected?.unsubscribe();
  store = null;
  sender = null;
  connected = null;
  currentUserId = null;
}
