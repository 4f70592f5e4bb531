// What a tree version's detail shows beside the version itself: how many of the workshop's
// cases were walked on it, and who published it.
import { User } from '../../db/models/index';
import type { TreeVersion } from '../../db/models/index';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { caseCountsByVersion } from './list-tree-library';

export interface VersionUsage {
  caseCount: number;
  publisher: User | null;
}

export async function getVersionUsage(options: {
  actor: Actor;
  version: TreeVersion;
}): Promise<VersionUsage> {
  const { actor, version } = options;
  assertCan(actor, 'trees.read');
  const counts = await caseCountsByVersion(actor.workshopId, [version.treeId]);
  const publisher = version.publishedBy
    ? await User.findOne({ where: { id: version.publishedBy, workshopId: actor.workshopId } })
    : null;
  return { caseCount: counts.get(version.id) ?? 0, publisher };
}
