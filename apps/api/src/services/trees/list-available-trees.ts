// The trees a case can start from, with the version a new case would be pinned to. A tree never
// published cannot start a case: only the lead sees it here (marked "no published version yet"),
// as a reminder to publish it.
import { QueryTypes } from 'sequelize';
import type { AvailableTree } from '@heatpath/contracts';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { database } from '../../db/with-transaction';

export async function listAvailableTrees(options: { actor: Actor }): Promise<AvailableTree[]> {
  assertCan(options.actor, 'trees.read');
  const rows = await database().query<{
    id: string;
    key: string;
    title: string;
    symptom: string;
    version_id: string | null;
    version: number | null;
  }>(
    `SELECT t.id, t.key, t.title, t.symptom, v.id AS version_id, v.version
       FROM trees t
       LEFT JOIN LATERAL (
         SELECT id, version FROM tree_versions
          WHERE tree_id = t.id AND status = 'published'
          ORDER BY version DESC LIMIT 1
       ) v ON true
      WHERE t.workshop_id = $1 AND ($2 OR v.id IS NOT NULL)
      ORDER BY t.title`,
    {
      bind: [options.actor.workshopId, options.actor.role === 'lead'],
      type: QueryTypes.SELECT,
    },
  );
  return rows.map((r) => ({
    id: r.id,
    key: r.key,
    title: r.title,
    symptom: r.symptom,
    latestPublished:
      r.version_id && r.version !== null ? { id: r.version_id, version: r.version } : null,
  }));
}
