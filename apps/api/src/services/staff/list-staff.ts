// The people of the caller's workshop.
import { User } from '../../db/models/index';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';

export async function listStaff(options: { actor: Actor }): Promise<User[]> {
  assertCan(options.actor, 'staff.manage');
  return User.findAll({
    where: { workshopId: options.actor.workshopId },
    order: [
      ['active', 'DESC'],
      ['name', 'ASC'],
    ],
  });
}
