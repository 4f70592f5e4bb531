// Accepts one answer or step back for a case. The case row is locked, the stored events are
// replayed on the pinned tree, and the event is accepted only if the walk is where the client
// says it is; it is stored before the response, so the next step never shows for an answer that
// was not kept. A retry with the same idempotency key gets the stored result, not a second answer.
// An answer at a step whose required photo or log the case does not hold yet is refused (422).
// The reply carries what the answer changed on the case (status, findings, what the person may
// do next), so the page never has to read the whole case again.
import type { Transaction } from 'sequelize';
import type { CaseChanges } from '@heatpath/contracts';
import { applyWalkEvent, describeWalk, replayWalk } from '@heatpath/fault-tree';
import type { CompiledTree, WalkEvent, WalkSummary } from '@heatpath/fault-tree';
import { Finding, TreeVersion, User } from '../../db/models/index';
import type { DiagnosticCase } from '../../db/models/index';
import { withTransaction } from '../../db/with-transaction';
import { AppError } from '../../errors';
import { presentCaseChanges } from '../../presenters/case.presenter';
import { compiledPublishedTree } from '../../lib/compiled-trees';
import { isOpenToWalking, statusAfterWalking } from '../../policies/case-policy';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { appendCaseEvent } from './append-case-event';
import { draftFindings } from './draft-findings';
import { findCase } from './find-case';
import { assertEvidenceForAnswer } from './required-evidence';
import { walkEventsAndKey } from './walk-state';

/** JSON with keys sorted, so a stored event (jsonb reorders keys) compares with a fresh one. */
function canonical(value: unknown): string {
  return JSON.stringify(value, (_key, v: unknown) =>
    v !== null && typeof v === 'object' && !Array.isArray(v)
      ? Object.fromEntries(Object.entries(v).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)))
      : v,
  );
}

/**
 * Whether a repeated request carries the answer stored under its key: the request is checked
 * again where the walk stood then, and the event it makes compared with the stored one in the
 * shape the walk keeps (a key the schema drops, or a different key order, is no difference).
 */
function sameAnswer(tree: CompiledTree, events: unknown[], index: number, event: unknown): boolean {
  const before = replayWalk(tree, events.slice(0, index));
  const again = applyWalkEvent(tree, before.snapshot, event);
  return again.ok && canonical(again.event) === canonical(events[index]);
}

export interface SubmitResult {
  walk: WalkSummary;
  /** True when this request repeated an already stored one (same idempotency key). */
  repeated: boolean;
  /** The case as it stands after the answer. */
  case: CaseChanges;
}

async function caseChanges(
  actor: Actor,
  kase: DiagnosticCase,
  walk: WalkSummary,
  transaction: Transaction,
): Promise<CaseChanges> {
  const finding = await Finding.findOne({
    where: { caseId: kase.id },
    include: [{ model: User, as: 'editor' }],
    transaction,
  });
  return presentCaseChanges({
    kase,
    walk,
    findings: finding
      ? { finding, editor: (finding as Finding & { editor?: User }).editor ?? null }
      : null,
    actor,
  });
}

export async function submitWalkEvent(options: {
  actor: Actor;
  caseId: string;
  event: unknown;
  idempotencyKey: string;
}): Promise<SubmitResult> {
  const { actor, caseId, idempotencyKey } = options;
  assertCan(actor, 'cases.walk');

  return withTransaction(async (transaction) => {
    const kase = await findCase({ actor, caseId, transaction, lock: true, bare: true });
    const tree = await compiledPublishedTree(kase.treeVersionId, (id) =>
      TreeVersion.findByPk(id, { transaction }),
    );
    const { events, keyed } = await walkEventsAndKey(kase.id, idempotencyKey, transaction);

    const replay = replayWalk(tree, events);
    const summary = (snapshot = replay.snapshot, applied = replay.applied): WalkSummary => ({
      ...describeWalk(tree, snapshot),
      divergence: replay.divergence,
      applied,
    });

    if (keyed !== null) {
      if (keyed === 'other' || !sameAnswer(tree, events, keyed, options.event)) {
        throw new AppError(
          'conflict',
          'This request repeats an earlier one (the same idempotency key) with a different answer. The earlier answer is kept; send a new answer as a new request.',
        );
      }
      const walk = summary();
      return { walk, repeated: true, case: await caseChanges(actor, kase, walk, transaction) };
    }

    if (!isOpenToWalking(kase)) {
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
    await assertEvidenceForAnswer({ tree, caseId: kase.id, event: stored, transaction });
    const walk = summary(result.snapshot, replay.applied + 1);
    await appendCaseEvent({
      actor,
      kase,
      kind: stored.type === 'walk.back' ? 'back' : 'answer',
      nodeId: stored.nodeId,
      payload: { event: stored },
      idempotencyKey,
      caseChanges: {
        currentNodeId: walk.currentNodeId,
        currentStepTitle: walk.currentNode.title.slice(0, 200),
        outcomeNodeId: walk.outcome?.id ?? null,
        status: statusAfterWalking(kase),
      },
      transaction,
    });
    await draftFindings({ kase, walk, actorId: actor.userId, transaction });
    return { walk, repeated: false, case: await caseChanges(actor, kase, walk, transaction) };
  });
}
