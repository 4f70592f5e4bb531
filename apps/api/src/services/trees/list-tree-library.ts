// The workshop's tree library: each tree with its versions, open draft and how many cases used
// each version. Only leads see drafts.
import { QueryTypes } from 'sequelize';
import type { TreeLibraryEntry } from '@heatpath/contracts';
import { Tree, TreeVersion, User } from '../../db/models/index';
import { database } from '../../db/with-transaction';
import { presentVersionInfo } from '../../presenters/tree.presenter';
import { assertCan, can } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';

export async function caseCountsByVersion(
  workshopId: string,
  treeIds: string[],
): Promise<Map<string, number>> {
  if (treeIds.length === 0) return new Map();
  const rows = await database().query<{ tree_version_id: string; n: string }>(
    `SELECT c.tree_version_id, count(*) AS n FROM cases c JOIN tree_versions v ON v.id = c.tree_version_id
      WHERE c.workshop_id = $1 AND v.tree_id = ANY($2::uuid[]) GROUP BY c.tree_version_id`,
    { bind: [workshopId, treeIds], type: QueryTypes.SELECT },
  );
  return new Map(rows.map((r) => [r.tree_version_id, Number(r.n)]));
}

export async function listTreeLibrary(options: {
  actor: Actor;
  treeId?: string;
}): Promise<TreeLibraryEntry[]> {
  const { actor } = options;
  assertCan(actor, 'trees.read');
  const trees = await Tree.findAll({
    where: { workshopId: actor.workshopId, ...(options.treeId ? { id: options.treeId } : {}) },
    order: [['title', 'ASC']],
  });
  const versions = await TreeVersion.findAll({
    where: { workshopId: actor.workshopId, treeId: trees.map((t) => t.id) },
    attributes: { exclude: ['definition'] },
    include: [{ model: User, as: 'publisher' }],
    order: [['version', 'DESC']],
  });
  const counts = await caseCountsByVersion(
    actor.workshopId,
    trees.map((t) => t.id),
  );
  const seesDrafts = can(actor, 'trees.edit');
  return trees.map((tree) => {
    const mine = versions.filter(
      (v) => v.treeId === tree.id && (seesDrafts || v.status !== 'draft'),
    );
    const info = (v: TreeVersion) =>
      presentVersionInfo(v, {
        caseCount: counts.get(v.id) ?? 0,
        publisher: (v as TreeVersion & { publisher?: User }).publisher,
      });
    const published = mine.find((v) => v.status === 'published');
    const draft = mine.find((v) => v.status === 'draft');
    return {
      id: tree.id,
      key: tree.key,
      title: tree.title,
      symptom: tree.symptom,
      latestPublished: published ? info(published) : null,
      draft: draft ? info(draft) : null,
      versions: mine.map(info),
    };
  });
}
