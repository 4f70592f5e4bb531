// The walk on this tablet. The pinned tree's machine runs here as an XState actor, started from
// the server's confirmed history plus the answers still in the outbox. A tap checks the answer
// with the same code the server runs, moves the actor on (the next step shows at once) and queues
// the answer; the sender delivers it and writes the server's reply into the cached case. When the
// server's history stops being the beginning of this one (the case moved on elsewhere, or an
// answer was refused) the case page builds the actor again from the server's history
// (`onRebuild`), and answers that no longer fit are held for the person to decide.
import type { CaseDetail } from '@heatpath/contracts';
import {
  checkAnswer,
  describeWalk,
  type CompiledTree,
  type WalkEvent,
  type WalkSnapshot,
  type WalkSummary,
} from '@heatpath/fault-tree';
import { useActorRef, useSelector } from '@xstate/react';
import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import type { WalkModel } from '../../../components/walk-step/measurement-form';
import { holdOutboxItems, isPending, newOutboxKey, useOutbox } from '../../../lib/outbox';
import { buildLocalWalk, isPrefixOf, queuedAnswers } from '../local-walk';
import { queueAnswer } from '../queue-answer';
import { keepReadingsForStep } from '../undone-readings';

export interface AnswerNotice {
  label: string;
  message: string;
  fields: Readonly<Record<string, string>>;
}

export interface WalkControls {
  /** The walk as the page shows it. */
  walk: WalkSummary;
  /** The tree and the walk's state, for previewing readings; null when the tree cannot run here. */
  model: WalkModel | null;
  answer: (event: WalkEvent, label: string, note?: string) => void;
  /** An answer this tablet refused before queuing it (the server would refuse it too). */
  notice: AnswerNotice | null;
  dismissNotice: () => void;
  /** Answers wait for the server before the next step can show (only when the tree cannot run here). */
  waitingForServer: boolean;
  /** Shows the step afresh (its boxes read their drafts again). */
  refresh: () => void;
}

const movedOn = 'The case had moved on elsewhere before this answer reached it.';

/** The readings a step back undoes go back into that step's boxes. */
function keepUndoneReadings(caseId: string, snapshot: WalkSnapshot): void {
  const last = snapshot.context.path.at(-1);
  if (last?.answer.type === 'answer.measurement') keepReadingsForStep(caseId, last.answer);
}

export function useLocalWalk({
  tree,
  detail,
  rebuilt,
  onRebuild,
}: {
  tree: CompiledTree;
  detail: CaseDetail;
  /**
   * Built again because the server's walk went elsewhere: queued answers that do not fit it are
   * held. On first opening they are not (the case kept on the tablet may be older than the
   * server's; the server then takes them, or refuses them and they are held).
   */
  rebuilt: boolean;
  onRebuild: () => void;
}): WalkControls {
  const caseId = detail.id;
  const items = useOutbox(caseId);
  // Built once per mount; the case page mounts this again (a new key) to rebuild.
  const [build] = useState(() => buildLocalWalk(tree, detail.walk.history, items));
  const applied = useRef(build.applied);
  const actor = useActorRef(tree.machine, { snapshot: build.snapshot });
  const snapshot = useSelector(actor, (state) => state);
  const [notice, setNotice] = useState<AnswerNotice | null>(null);

  // Answers that did not fit the server's walk wait for the person's choice.
  useEffect(() => {
    if (rebuilt && build.misfits.length > 0) {
      void holdOutboxItems(
        build.misfits.map((item) => item.seq),
        movedOn,
      );
    }
  }, [build, rebuilt]);

  const serverHistory = detail.walk.history;
  useEffect(() => {
    const refusedHere = items.some(
      (item) => item.kind === 'walk' && !isPending(item) && applied.current.has(item.key),
    );
    if (refusedHere) {
      onRebuild();
      return;
    }
    if (serverHistory === build.serverHistory) return;
    if (!isPrefixOf(serverHistory, actor.getSnapshot().context.history)) onRebuild();
  }, [actor, build, items, onRebuild, serverHistory]);

  const answer = useCallback(
    (event: WalkEvent, label: string, note?: string) => {
      const current = actor.getSnapshot();
      const check = checkAnswer(tree, current, event);
      if (!check.ok) {
        setNotice({
          label,
          message: check.rejection.message,
          fields: check.rejection.fields ?? {},
        });
        return;
      }
      setNotice(null);
      if (check.event.type === 'walk.back') keepUndoneReadings(caseId, current);
      const key = newOutboxKey();
      applied.current.add(key);
      actor.send(check.event);
      queueAnswer(caseId, key, check.event, label, note);
    },
    [actor, caseId, tree],
  );

  const walk = useMemo<WalkSummary>(
    () => ({
      ...describeWalk(tree, snapshot),
      divergence: detail.walk.divergence,
      applied: snapshot.context.history.length,
    }),
    [detail.walk.divergence, snapshot, tree],
  );
  const model = useMemo(() => ({ tree, snapshot }), [tree, snapshot]);
  const dismissNotice = useCallback(() => setNotice(null), []);
  return {
    walk,
    model,
    answer,
    notice,
    dismissNotice,
    waitingForServer: false,
    refresh: onRebuild,
  };
}

/**
 * A tree this browser cannot compile (it should not happen: the server compiled it): answers are
 * still queued and sent, and the page shows the server's walk as each reply arrives.
 */
export function useServerWalk(detail: CaseDetail): WalkControls {
  const caseId = detail.id;
  const items = useOutbox(caseId);
  const answer = useCallback(
    (event: WalkEvent, label: string, note?: string) =>
      queueAnswer(caseId, newOutboxKey(), event, label, note),
    [caseId],
  );
  return {
    walk: detail.walk,
    model: null,
    answer,
    notice: null,
    dismissNotice: () => undefined,
    waitingForServer: queuedAnswers(items).length > 0,
    refresh: () => undefined,
  };
}
