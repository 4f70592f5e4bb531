// The version of a tree that new cases start on: its highest published (not retired) version.
import type { Transaction } from 'sequelize';
import { Tree, TreeVersion } from '../../db/models/index';
import { AppError, notFound } from '../../errors';
import type { Actor } from '../../policies/permissions';

export async function latestPublishedVersion(options: {
  actor: Actor;
  treeId: string;
  transaction?: Transaction;
}) {
  const tree = await Tree.findOne({
    where: { id: options.treeId, workshopId: options.actor.workshopId },
    transaction: options.transaction,
  });
  if (!tree) throw notFound('That tree');
  const version = await TreeVersion.findOne({
    where: { treeId: tree.id, workshopId: options.actor.workshopId, status: 'published' },
    order: [['version', 'DESC']],
    transaction: options.transaction,
  });
  if (!version)
    throw new AppError(
      'conflict',
      `“${tree.title}” has no published version yet; a lead must publish it before cases can use it.`,
    );
  version.tree = tree;
  return version;
}
