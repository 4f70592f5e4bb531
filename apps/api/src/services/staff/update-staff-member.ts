// A lead changes a person's role, name or whether they can sign in. Past work stays theirs.
// Deactivating ends the person's sessions in the database itself (migration 0007's trigger), so
// reactivating them later does not bring an old session back.
import type { UpdateStaffRequest } from '@heatpath/contracts';
import { User } from '../../db/models/index';
import { AppError, notFound } from '../../errors';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { withTransaction } from '../../db/with-transaction';

export async function updateStaffMember(options: {
  actor: Actor;
  userId: string;
  changes: UpdateStaffRequest;
}): Promise<User> {
  const { actor, userId, changes } = options;
  assertCan(actor, 'staff.manage');
  return withTransaction(async (transaction) => {
    const user = await User.findOne({
      where: { id: userId, workshopId: actor.workshopId },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!user) throw notFound('That staff member');
    if (user.id === actor.userId) {
      if (changes.active === false) {
        throw new AppError('bad_request', 'You cannot deactivate your own account.');
      }
      if (changes.role && changes.role !== 'lead') {
        throw new AppError('bad_request', 'You cannot change your own role; ask another lead.');
      }
    }
    const losesLead =
      user.role === 'lead' &&
      user.active &&
      ((changes.role && changes.role !== 'lead') || changes.active === false);
    if (losesLead) {
      const leads = await User.count({
        where: { workshopId: actor.workshopId, role: 'lead', active: true },
        transaction,
      });
      if (leads <= 1) throw new AppError('conflict', 'A workshop needs at least one active lead.');
    }
    return user.update(changes, { transaction });
  });
}
