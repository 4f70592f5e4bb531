// The lead chooses which finished cases guard a tree: replayed before every publish.
import { Op } from 'sequelize';
import { DiagnosticCase, RegressionCase, TreeVersion } from '../../db/models/index';
import { AppError } from '../../errors';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { findTree } from './find-tree';
import { withTransaction } from '../../db/with-transaction';

export async function setRegressionSet(options: {
  actor: Actor;
  treeId: string;
  caseIds: string[];
}) {
  const { actor, treeId } = options;
  assertCan(actor, 'trees.edit');
  return withTransaction(async (transaction) => {
    const tree = await findTree({ actor, treeId, transaction, lock: true });
    const caseIds = [...new Set(options.caseIds)];
    const versionIds = (
      await TreeVersion.findAll({ where: { treeId: tree.id }, attributes: ['id'], transaction })
    ).map((v) => v.id);
    const cases = await DiagnosticCase.findAll({
      where: {
        id: { [Op.in]: caseIds },
        workshopId: actor.workshopId,
        treeVersionId: { [Op.in]: versionIds },
      },
      transaction,
    });
    if (cases.length !== caseIds.length)
      throw new AppError(
        'bad_request',
        'Some of those cases are not cases of this tree in your workshop.',
      );
    const unfinished = cases.filter((c) => c.status !== 'diagnosed' && c.status !== 'closed');
    if (unfinished.length)
      throw new AppError('bad_request', 'Only diagnosed or closed cases can guard a tree.');
    await RegressionCase.destroy({ where: { treeId: tree.id }, transaction });
    await RegressionCase.bulkCreate(
      caseIds.map((caseId) => ({
        treeId: tree.id,
        caseId,
        workshopId: actor.workshopId,
        addedBy: actor.userId,
      })),
      { transaction },
    );
    return caseIds;
  });
}
