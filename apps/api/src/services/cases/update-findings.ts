// The technician edits the drafted findings. A save names the revision it edited; a stale one
// gets 409 so two people cannot overwrite each other without knowing.
import type { UpdateFindingsRequest } from '@heatpath/contracts';
import { CaseEvent, Finding } from '../../db/models/index';
import { AppError, conflict } from '../../errors';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { findCase } from './find-case';

export async function updateFindings(options: {
  actor: Actor;
  caseId: string;
  input: UpdateFindingsRequest;
}) {
  const { actor, caseId, input } = options;
  assertCan(actor, 'findings.edit');
  const sequelize = Finding.sequelize;
  if (!sequelize) throw new Error('Models are not initialised.');
  return sequelize.transaction(async (transaction) => {
    const kase = await findCase({ actor, caseId, transaction, lock: true });
    if (kase.status === 'closed')
      throw new AppError('conflict', 'This case is closed; its findings can no longer change.');
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
    const { revision: _revision, ...changes } = input;
    await finding.update(
      { ...changes, revision: finding.revision + 1, updatedBy: actor.userId },
      { transaction },
    );
    await CaseEvent.create(
      {
        caseId: kase.id,
        workshopId: actor.workshopId,
        seq: kase.eventCount + 1,
        kind: 'findings',
        nodeId: finding.outcomeNodeId,
        payload: { revision: finding.revision },
        idempotencyKey: null,
        actorId: actor.userId,
      },
      { transaction },
    );
    await kase.update({ eventCount: kase.eventCount + 1 }, { transaction });
    return finding;
  });
}
