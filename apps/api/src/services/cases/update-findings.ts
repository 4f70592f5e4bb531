// Saves edited findings: the technician (or lead) until the case is diagnosed, then the advisor
// (or lead) reviewing them for the repair order. A save names the revision it edited; a stale
// one gets 409 so two people cannot overwrite each other without knowing. Every save is kept as
// a revision, and may choose the case's photos that go into the repair order.
import type { UpdateFindingsRequest } from '@heatpath/contracts';
import { Op } from 'sequelize';
import { Attachment, Finding } from '../../db/models/index';
import { withTransaction } from '../../db/with-transaction';
import { AppError, conflict } from '../../errors';
import { findingsSavePermission } from '../../policies/case-policy';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { appendCaseEvent } from './append-case-event';
import { findCase } from './find-case';
import { recordFindingsRevision } from './record-findings-revision';

export async function updateFindings(options: {
  actor: Actor;
  caseId: string;
  input: UpdateFindingsRequest;
}) {
  const { actor, caseId, input } = options;
  assertCan(actor, 'findings.save');
  return withTransaction(async (transaction) => {
    const kase = await findCase({ actor, caseId, transaction, lock: true });
    // Before diagnosis the findings are the technician's; after it, the advisor's to review.
    const permission = findingsSavePermission(kase);
    if (!permission)
      throw new AppError('conflict', 'This case is closed; its findings can no longer change.');
    assertCan(actor, permission);
    const finding = await Finding.findOne({
      where: { caseId: kase.id },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!finding)
      throw new AppError(
        'conflict',
        'There are no findings yet: the walk has not reached an outcome.',
      );
    if (finding.revision !== input.revision) {
      throw conflict(
        `Someone saved these findings after you opened them (now revision ${finding.revision}); reload to see their changes.`,
      );
    }
    const { revision: _revision, photoIds, ...changes } = input;
    const chosen = photoIds ? [...new Set(photoIds)] : finding.photoIds;
    if (photoIds && chosen.length > 0) {
      const photos = await Attachment.count({
        where: {
          id: { [Op.in]: chosen },
          caseId: kase.id,
          workshopId: actor.workshopId,
          kind: 'photo',
        },
        transaction,
      });
      if (photos !== chosen.length)
        throw new AppError('validation_failed', 'Choose only photos attached to this case.', {
          photoIds: 'Choose only photos attached to this case.',
        });
    }
    await finding.update(
      { ...changes, photoIds: chosen, revision: finding.revision + 1, updatedBy: actor.userId },
      { transaction },
    );
    await recordFindingsRevision({ finding, savedBy: actor.userId, transaction });
    await appendCaseEvent({
      actor,
      kase,
      kind: 'findings',
      nodeId: finding.outcomeNodeId,
      payload: { revision: finding.revision },
      transaction,
    });
    return finding;
  });
}
