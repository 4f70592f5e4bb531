// One answer given away from the case page (the logs screen's "use in the walk"), followed
// through the outbox: queued with its key like any answer, and reported as sending, not sent yet,
// refused, or overtaken by the case having moved on. The case page itself walks locally
// (use-local-walk.ts); both queue answers the same way.
import type { WalkEvent } from '@heatpath/fault-tree';
import { useCallback, useState } from 'react';
import { useMe } from '../../../lib/auth';
import {
  discardOutboxItem,
  newOutboxKey,
  outboxSender,
  useOutbox,
  useOutboxConnection,
} from '../../../lib/outbox';
import { queueAnswer } from '../queue-answer';

export interface PendingAnswer {
  key: string;
  event: WalkEvent;
  label: string;
  status: 'sending' | 'not-saved';
  /** Why it is not saved yet, in words. */
  problem: string | null;
}

export type AnswerOutcome =
  | { kind: 'moved-on'; label: string; message: string }
  | { kind: 'refused'; label: string; message: string; fields: Readonly<Record<string, string>> };

export interface WalkAnswers {
  pending: PendingAnswer | null;
  notice: AnswerOutcome | null;
  answer: (event: WalkEvent, label: string, note?: string) => void;
  retry: () => void;
  /** Gives up the answer on purpose (it leaves the outbox). */
  discard: () => void;
  dismissNotice: () => void;
}

export function useWalkAnswers(caseId: string): WalkAnswers {
  const me = useMe();
  useOutboxConnection(me.id);
  const items = useOutbox(caseId);
  const [key, setKey] = useState<string | null>(null);
  const item = items.find((queued) => queued.key === key && queued.kind === 'walk');
  const mine = item?.kind === 'walk' ? item : undefined;

  const answer = useCallback(
    (event: WalkEvent, label: string, note?: string) => {
      const next = newOutboxKey();
      setKey(next);
      queueAnswer(caseId, next, event, label, note);
    },
    [caseId],
  );
  const discard = useCallback(() => {
    if (mine) void discardOutboxItem(mine.seq);
    setKey(null);
  }, [mine]);

  const pending: PendingAnswer | null =
    mine && (mine.state === 'waiting' || mine.state === 'sending')
      ? {
          key: mine.key,
          event: mine.event,
          label: mine.label,
          status: mine.state === 'waiting' && mine.problem ? 'not-saved' : 'sending',
          problem: mine.problem,
        }
      : null;
  const notice: AnswerOutcome | null =
    mine?.state === 'held'
      ? { kind: 'moved-on', label: mine.label, message: mine.problem ?? '' }
      : mine?.state === 'refused'
        ? { kind: 'refused', label: mine.label, message: mine.problem ?? '', fields: {} }
        : null;

  return {
    pending,
    notice,
    answer,
    retry: () => outboxSender().kick(),
    discard,
    dismissNotice: () => setKey(null),
  };
}
