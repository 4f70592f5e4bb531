// One apprentice's progress with their history, for the lead.
import type { ApprenticeProgressDetail } from '@heatpath/contracts';
import { User } from '../../db/models/index';
import { notFound } from '../../errors';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { loadApprenticeProgress } from './apprentice-progress';

async function findApprentice(actor: Actor, apprenticeId: string): Promise<User> {
  const apprentice = await User.findOne({
    where: { id: apprenticeId, workshopId: actor.workshopId, role: 'apprentice' },
  });
  if (!apprentice) throw notFound('That apprentice');
  return apprentice;
}

export async function getApprenticeProgress(options: {
  actor: Actor;
  apprenticeId: string;
}): Promise<ApprenticeProgressDetail> {
  const { actor, apprenticeId } = options;
  assertCan(actor, 'training.manage');
  return loadApprenticeProgress({ actor, apprentice: await findApprentice(actor, apprenticeId) });
}
