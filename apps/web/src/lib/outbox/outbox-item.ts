// What the outbox keeps: every change the tablet made to a case and has not yet had confirmed by
// the server, in the order it was made. Each item gets its idempotency key when it is queued and
// keeps it through every try, so the server stores it once however often it is sent.
import type { WalkEvent } from '@heatpath/fault-tree';

export type OutboxState = 'waiting' | 'sending' | 'held' | 'refused';

interface ItemBase {
  /** Position in the queue (IndexedDB auto-increment): the order items are sent in. */
  seq: number;
  /** The idempotency key, made when the item was queued. */
  key: string;
  caseId: string;
  /** Who queued it; only that person's session sends it. */
  userId: string;
  createdAt: string;
  state: OutboxState;
  /** Why it is not sent yet, or why the server refused or held it, in words. */
  problem: string | null;
}

export interface WalkItem extends ItemBase {
  kind: 'walk';
  event: WalkEvent;
  /** The answer in words, as the person gave it ("Done", "Readings: 92 °C"). */
  label: string;
}

export interface NoteItem extends ItemBase {
  kind: 'note';
  text: string;
  nodeId: string | null;
}

export interface PhotoItem extends ItemBase {
  kind: 'photo';
  /** The file's bytes: kept as an ArrayBuffer, which every browser stores in IndexedDB. */
  bytes: ArrayBuffer;
  mediaType: string;
  name: string;
  nodeId: string | null;
}

export type OutboxItem = WalkItem | NoteItem | PhotoItem;

type WithoutQueueFields<T> = T extends unknown ? Omit<T, 'seq' | 'state' | 'problem'> : never;

/** An item as it is handed to the queue: the queue gives it its place and state. */
export type NewOutboxItem = WithoutQueueFields<OutboxItem>;

export function isPending(item: OutboxItem): boolean {
  return item.state === 'waiting' || item.state === 'sending';
}
