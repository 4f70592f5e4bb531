// Sends the queue: the signed-in person's items, oldest first, one at a time, each with the key
// it was queued with, so the server stores each exactly once even when a reply is lost or the tab
// is reloaded mid-send. Only one tab sends at a time (a Web Lock where the browser has them).
// What happens on failure:
// - no connection, no reply in time, or the server's own trouble (5xx, 429): the item waits and is
//   tried again on a backoff, when the browser comes back online, or when asked to;
// - 401: sending stops until the person signs in again (nothing is dropped);
// - 409 on an answer (the case moved on elsewhere): that answer and every later answer of the case
//   are held for the person to decide; notes and photos still go;
// - any other refusal: the item is marked refused with the server's words and kept on screen.
import { isApiError } from '../api-client';
import { isPending, type OutboxItem } from './outbox-item';
import type { OutboxStore } from './outbox-store';
import { sendItem, type Delivery } from './send-item';

export interface SenderStatus {
  /** The session ended: nothing is sent until the person signs in again. */
  signedOut: boolean;
  /** The last try failed for want of a connection; another is scheduled. */
  retrying: boolean;
}

export interface OutboxSenderOptions {
  store: OutboxStore;
  send?: (item: OutboxItem) => Promise<Delivery>;
  onDelivered?: (delivery: Delivery) => void;
  /** An answer of the case was held: the case stands elsewhere now and should be read again. */
  onHeld?: (caseId: string) => void;
  retryDelaysMs?: readonly number[];
  lockName?: string;
}

export interface OutboxSender {
  /** Whose items are sent (the signed-in person); null sends nothing. */
  setUser(userId: string | null): void;
  /** Sends what waits now (after queuing, on `online`, on "Retry"). */
  kick(): void;
  /** The person signed in again: sending resumes. */
  signedIn(): void;
  /** Settles when the sender has nothing more to do for now. */
  settled(): Promise<void>;
  status(): SenderStatus;
  subscribe(listener: () => void): () => void;
  setHandlers(handlers: Pick<OutboxSenderOptions, 'onDelivered' | 'onHeld'>): void;
  stop(): void;
}

export const signInToSend = 'Sign in again to send.';
const noConnection = 'No connection to the server yet. It is sent by itself when there is one.';
const noReply = 'No answer from the server in time. The connection may be weak.';

type FailureOutcome =
  | { kind: 'retry'; problem: string }
  | { kind: 'signed-out' }
  | { kind: 'held'; problem: string }
  | { kind: 'refused'; problem: string };

function classify(item: OutboxItem, error: unknown): FailureOutcome {
  if (!isApiError(error)) return { kind: 'retry', problem: noReply };
  if (error.code === 'network' || error.status === 0)
    return { kind: 'retry', problem: noConnection };
  if (error.status === 401) return { kind: 'signed-out' };
  if (
    error.code === 'bad_response' ||
    error.status === 408 ||
    error.status === 429 ||
    error.status >= 500
  ) {
    return { kind: 'retry', problem: error.message };
  }
  if (error.status === 409 && item.kind === 'walk') return { kind: 'held', problem: error.message };
  return { kind: 'refused', problem: error.message };
}

const defaultRetryDelaysMs = [2_000, 5_000, 10_000, 30_000, 60_000];

export function createOutboxSender(options: OutboxSenderOptions): OutboxSender {
  const { store, send = sendItem } = options;
  const retryDelaysMs = options.retryDelaysMs ?? defaultRetryDelaysMs;
  const lockName = options.lockName ?? 'heatpath-outbox-send';
  let handlers: Pick<OutboxSenderOptions, 'onDelivered' | 'onHeld'> = options;
  let userId: string | null = null;
  let status: SenderStatus = { signedOut: false, retrying: false };
  let failures = 0;
  let retryTimer: ReturnType<typeof setTimeout> | undefined;
  let running: Promise<void> | null = null;
  let again = false;
  let stopped = false;
  const listeners = new Set<() => void>();

  const setStatus = (next: Partial<SenderStatus>) => {
    const merged = { ...status, ...next };
    if (merged.signedOut === status.signedOut && merged.retrying === status.retrying) return;
    status = merged;
    for (const listener of listeners) listener();
  };

  const scheduleRetry = () => {
    clearTimeout(retryTimer);
    const delay = retryDelaysMs[Math.min(failures, retryDelaysMs.length - 1)] ?? 60_000;
    failures += 1;
    retryTimer = setTimeout(() => sender.kick(), delay);
  };

  const hold = async (from: OutboxItem, problem: string) => {
    const later = store
      .all()
      .filter(
        (item) =>
          item.caseId === from.caseId &&
          item.kind === 'walk' &&
          item.seq >= from.seq &&
          isPending(item),
      );
    await store.updateMany(
      later.map((item) => item.seq),
      { state: 'held', problem },
    );
  };

  /** Sends until the queue is empty or a failure says to wait (then returns true). */
  const drain = async (): Promise<boolean> => {
    await store.ready;
    await store.reload();
    for (;;) {
      if (stopped || status.signedOut || userId === null) return true;
      const me = userId;
      const next = store.all().find((item) => item.userId === me && isPending(item));
      if (!next) {
        failures = 0;
        setStatus({ retrying: false });
        return false;
      }
      if (next.state !== 'sending') {
        await store.update(next.seq, { state: 'sending', problem: null });
      }
      let delivery: Delivery;
      try {
        delivery = await send({ ...next, state: 'sending', problem: null });
      } catch (error) {
        if (stopped) return true;
        const outcome = classify(next, error);
        if (outcome.kind === 'retry') {
          await store.update(next.seq, { state: 'waiting', problem: outcome.problem });
          setStatus({ retrying: true });
          scheduleRetry();
          return true;
        }
        if (outcome.kind === 'signed-out') {
          await store.update(next.seq, { state: 'waiting', problem: signInToSend });
          setStatus({ signedOut: true, retrying: false });
          return true;
        }
        if (outcome.kind === 'held') {
          await hold(next, outcome.problem);
          handlers.onHeld?.(next.caseId);
        } else {
          await store.update(next.seq, { state: 'refused', problem: outcome.problem });
        }
        continue;
      }
      if (stopped) return true;
      handlers.onDelivered?.(delivery);
      await store.remove(next.seq);
      failures = 0;
      setStatus({ retrying: false });
    }
  };

  const locked = <T>(work: () => Promise<T>): Promise<T> => {
    const locks = typeof navigator === 'undefined' ? undefined : navigator.locks;
    return locks ? (locks.request(lockName, work) as Promise<T>) : work();
  };

  const sender: OutboxSender = {
    setUser(next) {
      if (next === userId) return;
      userId = next;
      setStatus({ signedOut: false });
      sender.kick();
    },
    kick() {
      if (stopped) return;
      clearTimeout(retryTimer);
      if (running) {
        again = true;
        return;
      }
      running = (async () => {
        let waiting: boolean;
        do {
          again = false;
          try {
            // After a failure, only the retry timer, `online` or a sign-in send again.
            waiting = await locked(drain);
          } catch {
            // IndexedDB failed under us; the next kick (online, timer, a new item) tries again.
            waiting = true;
          }
        } while (again && !stopped && !waiting);
      })().finally(() => {
        running = null;
      });
    },
    signedIn() {
      setStatus({ signedOut: false });
      sender.kick();
    },
    async settled() {
      while (running) await running;
    },
    status: () => status,
    subscribe(listener) {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
    setHandlers(next) {
      handlers = next;
    },
    stop() {
      stopped = true;
      clearTimeout(retryTimer);
      listeners.clear();
    },
  };
  return sender;
}
