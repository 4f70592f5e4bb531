// Brings every workshop's copies of the shipped trees up to the definitions Heatpath ships now.
// A tree whose latest published version is one Heatpath shipped earlier gets the current
// definition as a new published version (cases pinned to the older version keep reading it); a
// tree the lead has edited and published is left as the lead made it; a workshop missing a
// shipped tree gets it. Safe to run at every start: a tree already current is not touched.
import type { Sequelize, Transaction } from 'sequelize';
import { contentFingerprintOf } from '@heatpath/fault-tree';
import type { TreeDefinition } from '@heatpath/fault-tree';
import { shippedTrees } from '@heatpath/fault-tree/trees';
import { shippedHistory } from '@heatpath/fault-tree/trees/history';
import { Tree, TreeVersion, Workshop } from '../../db/models/index';
import { installShippedTrees } from './install-shipped-trees';

export type ShippedTreeChange =
  | { readonly workshopId: string; readonly treeKey: string; readonly change: 'installed' }
  | {
      readonly workshopId: string;
      readonly treeKey: string;
      readonly change: 'updated';
      readonly version: number;
    }
  | { readonly workshopId: string; readonly treeKey: string; readonly change: 'kept-lead-edits' };

// Advisory lock key so two processes starting at once do not publish the same update twice.
const UPDATE_LOCK = 734053;

export async function updateShippedTrees(options: {
  sequelize: Sequelize;
  /** Only these workshops; every workshop when left out. */
  workshopIds?: readonly string[];
}): Promise<ShippedTreeChange[]> {
  const changes: ShippedTreeChange[] = [];
  const workshops = await Workshop.findAll({
    attributes: ['id'],
    ...(options.workshopIds ? { where: { id: [...options.workshopIds] } } : {}),
    order: [['createdAt', 'ASC']],
  });
  for (const workshop of workshops) {
    await options.sequelize.transaction(async (transaction) => {
      await options.sequelize.query('SELECT pg_advisory_xact_lock($1)', {
        bind: [UPDATE_LOCK],
        transaction,
      });
      for (const definition of shippedTrees) {
        const change = await updateOne(workshop.id, definition, transaction);
        if (change) changes.push(change);
      }
    });
  }
  return changes;
}

async function updateOne(
  workshopId: string,
  definition: TreeDefinition,
  transaction: Transaction,
): Promise<ShippedTreeChange | null> {
  const treeKey = definition.id;
  const tree = await Tree.findOne({
    where: { workshopId, key: treeKey },
    transaction,
    lock: transaction.LOCK.UPDATE,
  });
  if (!tree) {
    const installed = await installShippedTrees({
      workshopId,
      userId: null,
      transaction,
      definitions: [definition],
    });
    return installed.length > 0 ? { workshopId, treeKey, change: 'installed' } : null;
  }
  const versions = await TreeVersion.findAll({
    where: { treeId: tree.id, workshopId },
    order: [['version', 'DESC']],
    transaction,
  });
  const current = contentFingerprintOf(definition);
  if (versions.some((v) => v.status !== 'draft' && contentFingerprintOf(v.definition) === current))
    return null;
  const latestPublished = versions.find((v) => v.status === 'published');
  if (!latestPublished) return null;
  const history = shippedHistory[treeKey];
  const earlier = new Set((history?.earlier ?? []).map((d) => contentFingerprintOf(d)));
  if (!earlier.has(contentFingerprintOf(latestPublished.definition))) {
    return { workshopId, treeKey, change: 'kept-lead-edits' };
  }
  // The new version takes the next number; a draft in progress moves one up so the published
  // versions stay in the order they were published.
  const highest = versions[0]?.version ?? 0;
  const draft = versions.find((v) => v.status === 'draft');
  let version = highest + 1;
  if (draft) {
    version = draft.version;
    await draft.update({ version: highest + 1 }, { transaction });
  }
  await TreeVersion.create(
    {
      treeId: tree.id,
      workshopId,
      version,
      status: 'published',
      definition,
      changeNote: history?.changeNote ?? 'Updated by Heatpath.',
      basedOnVersion: latestPublished.version,
      createdBy: null,
      publishedBy: null,
      publishedAt: new Date(),
    },
    { transaction },
  );
  return { workshopId, treeKey, change: 'updated', version };
}
