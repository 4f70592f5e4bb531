// One tree of the workshop's library, with the cases in its regression set.
import type { TreeLibraryEntry } from '@heatpath/contracts';
import { RegressionCase } from '../../db/models/index';
import { AppError } from '../../errors';
import type { Actor } from '../../policies/permissions';
import { listTreeLibrary } from './list-tree-library';

export async function getTree(options: {
  actor: Actor;
  treeId: string;
}): Promise<TreeLibraryEntry & { regressionCaseIds: string[] }> {
  const { actor, treeId } = options;
  const [entry] = await listTreeLibrary({ actor, treeId });
  if (!entry) throw new AppError('not_found', 'That tree was not found.');
  const regression = await RegressionCase.findAll({
    where: { treeId: entry.id, workshopId: actor.workshopId },
  });
  return { ...entry, regressionCaseIds: regression.map((r) => r.caseId) };
}
