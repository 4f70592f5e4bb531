// Deletes a tree that was never published: a blank or copied tree the lead started and does not
// want. Its only version is a draft, so no case was ever pinned to it. A tree with any published
// (or retired) version stays: cases and the audit trail point at its versions.
import { Op } from 'sequelize';
import { RegressionCase, TreeVersion } from '../../db/models/index';
import { conflict } from '../../errors';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { findTree } from './find-tree';
import { withTransaction } from '../../db/with-transaction';

export async function deleteUnpublishedTree(options: { actor: Actor; treeId: string }) {
  const { actor } = options;
  assertCan(actor, 'trees.delete');
  await withTransaction(async (transaction) => {
    // Locking the tree row holds off a publish of its draft (which locks it too) until we finish.
    const tree = await findTree({ actor, treeId: options.treeId, transaction, lock: true });
    const published = await TreeVersion.count({
      where: { treeId: tree.id, status: { [Op.ne]: 'draft' } },
      transaction,
    });
    if (published > 0)
      throw conflict(
        `“${tree.title}” has been published, so cases may rely on it and it cannot be deleted. Retire its versions instead.`,
      );
    await RegressionCase.destroy({ where: { treeId: tree.id }, transaction });
    await TreeVersion.destroy({ where: { treeId: tree.id, status: 'draft' }, transaction });
    await tree.destroy({ transaction });
  });
}
