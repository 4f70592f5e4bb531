// Sends the walk's answers so that none is lost on the bay's Wi-Fi. Each answer gets one
// idempotency key when it is given and keeps it through every retry, so the server stores it
// once however often it is sent. Until the server has stored it the answer stays on screen (and
// in this device's storage, through a reload) as "not saved yet", is retried when the browser
// comes back online and on a gentle timer, and the next step appears only from the server's reply.
import type { CaseDetail } from '@heatpath/contracts';
import type { WalkEvent } from '@heatpath/fault-tree';
import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useRef, useState } from 'react';
import { isApiError } from '../../../lib/api-client';
import { useAddCaseNote } from '../api/add-case-note';
import { casesKeys } from '../api/get-cases';
import { useSubmitWalkEvent } from '../api/submit-walk-event';

export interface PendingAnswer {
  /** Made once per answer; every retry sends the same key. */
  key: string;
  event: WalkEvent;
  /** The answer in words, as the person gave it ("Done", "Readings: 92 °C"). */
  label: string;
  /** A note given with the answer; it is stored first, with its own key. */
  note: { key: string; text: string; saved: boolean } | null;
  status: 'sending' | 'not-saved';
  /** Why it is not saved yet, in words. */
  problem: string | null;
  attempts: number;
}

export type AnswerNotice =
  | { kind: 'moved-on'; label: string; message: string }
  | { kind: 'refused'; label: string; message: string; fields: Readonly<Record<string, string>> };

export interface WalkAnswers {
  pending: PendingAnswer | null;
  notice: AnswerNotice | null;
  /** Sends an answer now; ignored while another is still waiting to be stored. */
  answer: (event: WalkEvent, label: string, note?: string) => void;
  retry: () => void;
  /** Gives up an unsaved answer on purpose, and re-reads the case. */
  discard: () => void;
  dismissNotice: () => void;
}

/** A request that has had no reply by then is treated as lost and tried again. */
const requestTimeoutMs = 20_000;
const retryDelaysMs = [3_000, 6_000, 12_000, 24_000, 30_000];

function storageKey(caseId: string): string {
  return `heatpath.pending-answer.${caseId}`;
}

function restore(caseId: string): PendingAnswer | null {
  try {
    const text = window.localStorage.getItem(storageKey(caseId));
    if (!text) return null;
    const stored = JSON.parse(text) as PendingAnswer;
    if (typeof stored.key !== 'string' || typeof stored.event?.type !== 'string') return null;
    return {
      ...stored,
      status: 'not-saved',
      problem: 'This answer was kept on this device and has not reached the server yet.',
    };
  } catch {
    return null;
  }
}

function persist(caseId: string, pending: PendingAnswer | null): void {
  try {
    if (pending) window.localStorage.setItem(storageKey(caseId), JSON.stringify(pending));
    else window.localStorage.removeItem(storageKey(caseId));
  } catch {
    // Private mode or a full disk: the answer still lives on screen until it is stored.
  }
}

function newKey(): string {
  return crypto.randomUUID();
}

function timeoutSignal(): AbortSignal | undefined {
  return typeof AbortSignal.timeout === 'function'
    ? AbortSignal.timeout(requestTimeoutMs)
    : undefined;
}

/** Failures that another try may cure: no connection, no reply, or the server's own trouble. */
function isRetryable(error: unknown): boolean {
  if (!isApiError(error)) return true;
  return (
    error.code === 'network' ||
    error.code === 'bad_response' ||
    error.status === 0 ||
    error.status === 401 ||
    error.status === 429 ||
    error.status >= 500
  );
}

function problemOf(error: unknown): string {
  if (isApiError(error)) {
    if (error.status === 401) return 'Your session has ended. Sign in again to send it.';
    return error.message;
  }
  return 'No answer from the server in time. The connection may be weak.';
}

export function useWalkAnswers(caseId: string): WalkAnswers {
  const queryClient = useQueryClient();
  const { mutateAsync: submitAsync } = useSubmitWalkEvent();
  const { mutateAsync: addNoteAsync } = useAddCaseNote();
  const [pending, setPendingState] = useState<PendingAnswer | null>(() => restore(caseId));
  const [notice, setNotice] = useState<AnswerNotice | null>(null);
  const pendingRef = useRef(pending);
  const inFlight = useRef(false);
  const retryTimer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  // The retry timer and the online listener call the latest `send` through this.
  const sendRef = useRef<() => Promise<void>>(() => Promise.resolve());

  const setPending = useCallback(
    (next: PendingAnswer | null) => {
      pendingRef.current = next;
      setPendingState(next);
      persist(caseId, next);
    },
    [caseId],
  );

  const send = useCallback(async () => {
    const first = pendingRef.current;
    if (!first || inFlight.current) return;
    inFlight.current = true;
    clearTimeout(retryTimer.current);
    setPending({ ...first, status: 'sending', attempts: first.attempts + 1 });
    try {
      const note = pendingRef.current?.note;
      if (note && !note.saved) {
        await addNoteAsync({
          caseId,
          note: { idempotencyKey: note.key, nodeId: first.event.nodeId, text: note.text },
          signal: timeoutSignal(),
        });
        const now = pendingRef.current;
        if (now) setPending({ ...now, note: { ...note, saved: true } });
      }
      const response = await submitAsync({
        caseId,
        idempotencyKey: first.key,
        event: first.event,
        signal: timeoutSignal(),
      });
      // The next step comes from the server's reply: it is shown only once the answer is stored.
      queryClient.setQueryData<CaseDetail>(casesKeys.detail(caseId), (old) =>
        old
          ? {
              ...old,
              walk: response.walk,
              status: old.status === 'open' ? 'in_diagnosis' : old.status,
            }
          : old,
      );
      setPending(null);
      setNotice(null);
      // Findings, permissions and the history change with the walk; read them again.
      void queryClient.invalidateQueries({ queryKey: casesKeys.detail(caseId) });
      void queryClient.invalidateQueries({ queryKey: casesKeys.lists() });
    } catch (error) {
      const current = pendingRef.current;
      if (!current) return;
      if (isRetryable(error)) {
        setPending({ ...current, status: 'not-saved', problem: problemOf(error) });
        const delay = retryDelaysMs[Math.min(current.attempts - 1, retryDelaysMs.length - 1)];
        retryTimer.current = setTimeout(() => void sendRef.current(), delay);
      } else if (isApiError(error) && error.status === 409) {
        setPending(null);
        setNotice({ kind: 'moved-on', label: current.label, message: error.message });
        void queryClient.invalidateQueries({ queryKey: casesKeys.detail(caseId) });
      } else {
        setPending(null);
        setNotice({
          kind: 'refused',
          label: current.label,
          message: problemOf(error),
          fields: isApiError(error) ? error.fields : {},
        });
      }
    } finally {
      inFlight.current = false;
    }
  }, [addNoteAsync, caseId, queryClient, setPending, submitAsync]);

  useEffect(() => {
    sendRef.current = send;
  }, [send]);

  // An answer kept from before a reload is sent again at once; so is one waiting when the
  // browser reports the connection is back.
  useEffect(() => {
    if (pendingRef.current) void sendRef.current();
    const onOnline = () => {
      if (pendingRef.current?.status === 'not-saved') void sendRef.current();
    };
    window.addEventListener('online', onOnline);
    return () => {
      window.removeEventListener('online', onOnline);
      clearTimeout(retryTimer.current);
    };
  }, [caseId]);

  const answer = useCallback(
    (event: WalkEvent, label: string, noteText?: string) => {
      if (pendingRef.current) return;
      const text = noteText?.trim();
      setNotice(null);
      setPending({
        key: newKey(),
        event,
        label,
        note: text ? { key: newKey(), text, saved: false } : null,
        status: 'sending',
        problem: null,
        attempts: 0,
      });
      void send();
    },
    [send, setPending],
  );

  const retry = useCallback(() => void send(), [send]);

  const discard = useCallback(() => {
    clearTimeout(retryTimer.current);
    setPending(null);
    void queryClient.invalidateQueries({ queryKey: casesKeys.detail(caseId) });
  }, [caseId, queryClient, setPending]);

  const dismissNotice = useCallback(() => setNotice(null), []);

  return { pending, notice, answer, retry, discard, dismissNotice };
}
