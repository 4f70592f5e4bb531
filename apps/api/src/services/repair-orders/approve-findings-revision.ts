// The advisor (or lead) approves the latest revision of a diagnosed case's findings for the
// repair order. From then on the database refuses any change to it (migration 0004's trigger);
// later edits become a new revision that needs its own approval.
import { FindingsRevision } from '../../db/models/index';
import { withTransaction } from '../../db/with-transaction';
import { AppError, conflict } from '../../errors';
import { isOpenToReview } from '../../policies/case-policy';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { appendCaseEvent } from '../cases/append-case-event';
import { loadRepairOrderCase } from './load-repair-order';

export async function approveFindingsRevision(options: {
  actor: Actor;
  caseId: string;
  revision: number;
}): Promise<void> {
  const { actor, revision } = options;
  assertCan(actor, 'findings.review');
  await withTransaction(async (transaction) => {
    const { kase, finding } = await loadRepairOrderCase({ ...options, transaction, lock: true });
    if (!isOpenToReview(kase))
      throw new AppError('conflict', 'This case is closed; its repair order can no longer change.');
    if (finding.revision !== revision)
      throw conflict(
        `Revision ${revision} is not the latest: revision ${finding.revision} was saved after it. Review that one first.`,
      );
    const row = await FindingsRevision.findOne({
      where: { caseId: kase.id, workshopId: actor.workshopId, revision },
      transaction,
    });
    if (!row) throw new Error(`findings revision ${revision} of case ${kase.id} was never kept`);
    if (row.approvedAt) return;
    await row.update({ approvedAt: new Date(), approvedBy: actor.userId }, { transaction });
    await appendCaseEvent({
      actor,
      kase,
      kind: 'approval',
      nodeId: finding.outcomeNodeId,
      payload: { revision },
      transaction,
    });
  });
}
