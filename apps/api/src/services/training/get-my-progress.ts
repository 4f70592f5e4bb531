// The caller's own training progress.
import type { ApprenticeProgressDetail } from '@heatpath/contracts';
import { User } from '../../db/models/index';
import { notFound } from '../../errors';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { loadApprenticeProgress } from './apprentice-progress';

/** The caller's own progress: an apprentice never reads another's. */
export async function getMyProgress(options: { actor: Actor }): Promise<ApprenticeProgressDetail> {
  const { actor } = options;
  assertCan(actor, 'training.learn');
  const me = await User.findOne({ where: { id: actor.userId, workshopId: actor.workshopId } });
  if (!me) throw notFound('Your account');
  return loadApprenticeProgress({ actor, apprentice: me });
}
