// Every active apprentice's progress, for the lead's overview (without each one's history).
import type { ApprenticeProgress } from '@heatpath/contracts';
import { User } from '../../db/models/index';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { loadApprenticeProgress } from './apprentice-progress';

export async function listProgress(options: { actor: Actor }): Promise<ApprenticeProgress[]> {
  const { actor } = options;
  assertCan(actor, 'training.manage');
  const apprentices = await User.findAll({
    where: { workshopId: actor.workshopId, role: 'apprentice', active: true },
    order: [['name', 'ASC']],
  });
  const all = await Promise.all(
    apprentices.map((apprentice) => loadApprenticeProgress({ actor, apprentice })),
  );
  return all.map(({ history: _history, ...progress }) => progress);
}
