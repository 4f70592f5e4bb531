// Accepts one answer or step back for a case. The case row is locked, the stored events are
// replayed on the pinned tree, and the event is accepted only if the walk is where the client
// says it is; it is stored before the response, so the next step never shows for an answer that
// was not kept. A retry with the same idempotency key gets the stored result, not a second answer.
import { applyWalkEvent, describeWalk, replayWalk } from '@heatpath/fault-tree';
import type { WalkEvent, WalkSummary } from '@heatpath/fault-tree';
import { CaseEvent, DiagnosticCase, TreeVersion } from '../../db/models/index';
import { AppError } from '../../errors';
import { compiledPublishedTree } from '../../lib/compiled-trees';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { draftFindings } from './draft-findings';
import { findCase } from './find-case';
import { walkEventsAndKey } from './walk-state';

export interface SubmitResult {
  walk: WalkSummary;
  /** True when this request repeated an already stored one (same idempotency key). */
  repeated: boolean;
}

export async function submitWalkEvent(options: {
  actor: Actor;
  caseId: string;
  event: unknown;
  idempotencyKey: string;
}): Promise<SubmitResult> {
  const { actor, caseId, idempotencyKey } = options;
  assertCan(actor, 'cases.walk');
  const sequelize = DiagnosticCase.sequelize;
  if (!sequelize) throw new Error('Models are not initialised.');

  return sequelize.transaction(async (transaction) => {
    const kase = await findCase({ actor, caseId, transaction, lock: true, bare: true });
    const tree = await compiledPublishedTree(kase.treeVersionId, (id) =>
      TreeVersion.findByPk(id, { transaction }),
    );
    const { events, keySeen } = await walkEventsAndKey(kase.id, idempotencyKey, transaction);

    const replay = replayWalk(tree, events);
    const summary = (snapshot = replay.snapshot, applied = replay.applied): WalkSummary => ({
      ...describeWalk(tree, snapshot),
      divergence: replay.divergence,
      applied,
    });

    if (keySeen) return { walk: summary(), repeated: true };

    if (kase.status === 'diagnosed' || kase.status === 'closed') {
      throw new AppError(
        'conflict',
        `This case is already ${kase.status === 'closed' ? 'closed' : 'diagnosed'}; reopen it before changing the walk.`,
      );
    }
    if (replay.divergence) {
      throw new AppError(
        'conflict',
        `This case's record no longer fits its tree (${replay.divergence.reason}); ask a lead to look at it.`,
      );
    }
    const result = applyWalkEvent(tree, replay.snapshot, options.event);
    if (!result.ok) {
      const r = result.rejection;
      if (r.stale) {
        throw new AppError(
          'conflict',
          /reload/i.test(r.message)
            ? r.message
            : `${r.message} The case has moved on, perhaps on another device: reload to see where it stands.`,
        );
      }
      throw new AppError(
        r.code === 'malformed-event' ? 'bad_request' : 'validation_failed',
        r.message,
        r.fields ? { ...r.fields } : undefined,
      );
    }
    const stored: WalkEvent = result.event;
    await CaseEvent.create(
      {
        caseId: kase.id,
        workshopId: actor.workshopId,
        seq: kase.eventCount + 1,
        kind: stored.type === 'walk.back' ? 'back' : 'answer',
        nodeId: stored.nodeId,
        payload: { event: stored },
        idempotencyKey,
        actorId: actor.userId,
      },
      { transaction },
    );
    const walk = summary(result.snapshot, replay.applied + 1);
    await kase.update(
      {
        eventCount: kase.eventCount + 1,
        currentNodeId: walk.currentNodeId,
        currentStepTitle: walk.currentNode.title.slice(0, 200),
        outcomeNodeId: walk.outcome?.id ?? null,
        status: kase.status === 'open' ? 'in_diagnosis' : kase.status,
      },
      { transaction },
    );
    await draftFindings({ kase, walk, actorId: actor.userId, transaction });
    return { walk, repeated: false };
  });
}
