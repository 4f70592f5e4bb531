// Appends one entry to a case's history inside the caller's transaction and moves the case's
// event count on with it, so `seq` stays gapless. The caller holds the case row locked.
import type { Transaction } from 'sequelize';
import { CaseEvent } from '../../db/models/index';
import type { CaseEventKind } from '../../db/models/case-event';
import type { DiagnosticCase } from '../../db/models/index';
import type { Actor } from '../../policies/permissions';

export async function appendCaseEvent(options: {
  actor: Actor;
  /** The case, locked in `transaction`. */
  kase: DiagnosticCase;
  kind: CaseEventKind;
  nodeId: string | null;
  payload: Record<string, unknown>;
  /** The request's key, for events a retried request must find again. */
  idempotencyKey?: string | null;
  /** Other columns of the case to change in the same update as the count. */
  caseChanges?: Partial<
    Pick<
      DiagnosticCase,
      'status' | 'diagnosedAt' | 'currentNodeId' | 'currentStepTitle' | 'outcomeNodeId'
    >
  >;
  transaction: Transaction;
}): Promise<CaseEvent> {
  const { actor, kase, transaction } = options;
  const seq = kase.eventCount + 1;
  const event = await CaseEvent.create(
    {
      caseId: kase.id,
      workshopId: actor.workshopId,
      seq,
      kind: options.kind,
      nodeId: options.nodeId,
      payload: options.payload,
      idempotencyKey: options.idempotencyKey ?? null,
      actorId: actor.userId,
    },
    { transaction },
  );
  await kase.update({ ...options.caseChanges, eventCount: seq }, { transaction });
  return event;
}
