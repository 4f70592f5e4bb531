// A lead invites a person by e-mail: the person is added without a password, and an invitation
// with a single-use link to set one is written to the outbox in the same transaction.
import type { InviteStaffRequest } from '@heatpath/contracts';
import { UniqueConstraintError } from 'sequelize';
import type { Transaction } from 'sequelize';
import { User, Workshop } from '../../db/models/index';
import { conflict, notFound } from '../../errors';
import type { MailContext } from '../../lib/mail/mail-context';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { issueAccountToken } from '../accounts/account-tokens';
import { invitationMessage } from '../accounts/link-messages';
import { enqueueMail } from '../mail/enqueue-mail';
import { withTransaction } from '../../db/with-transaction';

export async function sendInvitation(options: {
  actor: Actor;
  user: User;
  ttlMinutes: number;
  mail: MailContext;
  transaction: Transaction;
}): Promise<void> {
  const { actor, user, transaction } = options;
  const [workshop, lead] = await Promise.all([
    Workshop.findByPk(actor.workshopId, { transaction }),
    User.findByPk(actor.userId, { transaction }),
  ]);
  if (!workshop || !lead) throw notFound('Your workshop');
  const { token } = await issueAccountToken({
    user,
    purpose: 'invitation',
    ttlMinutes: options.ttlMinutes,
    createdBy: actor.userId,
    transaction,
  });
  const words = invitationMessage({
    name: user.name,
    role: user.role,
    workshopName: workshop.name,
    invitedBy: lead.name,
    ttlMinutes: options.ttlMinutes,
  });
  await enqueueMail({
    workshopId: actor.workshopId,
    kind: 'invitation',
    to: [{ name: user.name, address: user.email }],
    subject: words.subject,
    text: words.text,
    link: `${options.mail.publicUrl}/set-password?token=${token}`,
    createdBy: actor.userId,
    mail: options.mail,
    transaction,
  });
}

export async function inviteStaffMember(options: {
  actor: Actor;
  input: InviteStaffRequest;
  ttlMinutes: number;
  mail: MailContext;
}): Promise<User> {
  const { actor, input } = options;
  assertCan(actor, 'staff.manage');
  try {
    return await withTransaction(async (transaction) => {
      const user = await User.create(
        {
          workshopId: actor.workshopId,
          email: input.email,
          name: input.name,
          role: input.role,
          passwordHash: null,
        },
        { transaction },
      );
      await sendInvitation({ ...options, user, transaction });
      return user;
    });
  } catch (error) {
    if (error instanceof UniqueConstraintError) {
      throw conflict('Someone already signs in with that e-mail address.');
    }
    throw error;
  }
}
