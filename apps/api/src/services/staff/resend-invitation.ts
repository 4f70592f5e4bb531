// A lead sends a fresh invitation to someone who has not set a password yet; the old link stops
// working.
import { User } from '../../db/models/index';
import { AppError, notFound } from '../../errors';
import type { MailContext } from '../../lib/mail/mail-context';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { sendInvitation } from './invite-staff-member';
import { withTransaction } from '../../db/with-transaction';

export async function resendInvitation(options: {
  actor: Actor;
  userId: string;
  ttlMinutes: number;
  mail: MailContext;
}): Promise<User> {
  const { actor, userId } = options;
  assertCan(actor, 'staff.manage');
  return withTransaction(async (transaction) => {
    const user = await User.findOne({
      where: { id: userId, workshopId: actor.workshopId },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!user) throw notFound('That staff member');
    if (user.passwordHash !== null)
      throw new AppError('conflict', `${user.name} has already set a password and can sign in.`);
    if (!user.active)
      throw new AppError('conflict', `${user.name} is deactivated; reactivate them first.`);
    await sendInvitation({ ...options, user, transaction });
    return user;
  });
}
