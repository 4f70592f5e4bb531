// Gives a workshop its own editable copies of the trees Heatpath ships, each published as
// version 1 so cases can start at once.
import type { Transaction } from 'sequelize';
import type { TreeDefinition } from '@heatpath/fault-tree';
import { shippedTrees } from '@heatpath/fault-tree/trees';
import { Tree, TreeVersion } from '../../db/models/index';

export async function installShippedTrees(options: {
  workshopId: string;
  userId: string | null;
  transaction?: Transaction;
  /** Only these shipped trees; all of them when left out. */
  definitions?: readonly TreeDefinition[];
}) {
  const { workshopId, userId, transaction } = options;
  const installed: TreeVersion[] = [];
  for (const definition of options.definitions ?? shippedTrees) {
    const [tree] = await Tree.findOrCreate({
      where: { workshopId, key: definition.id },
      defaults: {
        workshopId,
        key: definition.id,
        title: definition.title,
        symptom: definition.symptom,
      },
      transaction,
    });
    const existing = await TreeVersion.findOne({ where: { treeId: tree.id }, transaction });
    if (existing) continue;
    installed.push(
      await TreeVersion.create(
        {
          treeId: tree.id,
          workshopId,
          version: 1,
          status: 'published',
          definition,
          changeNote: 'Shipped with Heatpath.',
          createdBy: userId,
          publishedBy: userId,
          publishedAt: new Date(),
        },
        { transaction },
      ),
    );
  }
  return installed;
}
