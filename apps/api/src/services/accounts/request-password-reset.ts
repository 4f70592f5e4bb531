// "Forgot password": when an active account uses the address, a single-use reset link goes to
// it through the outbox. The caller learns nothing either way; the route answers the same.
import { User, Workshop } from '../../db/models/index';
import type { MailContext } from '../../lib/mail/mail-context';
import { enqueueMail } from '../mail/enqueue-mail';
import { issueAccountToken } from './account-tokens';
import { passwordResetMessage } from './link-messages';
import { withTransaction } from '../../db/with-transaction';

export async function requestPasswordReset(options: {
  email: string;
  ttlMinutes: number;
  mail: MailContext;
}): Promise<void> {
  await withTransaction(async (transaction) => {
    const user = await User.findOne({
      where: { email: options.email.toLowerCase(), active: true },
      include: [{ model: Workshop, as: 'workshop' }],
      transaction,
      lock: { level: transaction.LOCK.UPDATE, of: User },
    });
    if (!user?.workshop) return;
    const { token } = await issueAccountToken({
      user,
      purpose: 'password-reset',
      ttlMinutes: options.ttlMinutes,
      createdBy: null,
      transaction,
    });
    const words = passwordResetMessage({
      name: user.name,
      workshopName: user.workshop.name,
      ttlMinutes: options.ttlMinutes,
    });
    await enqueueMail({
      workshopId: user.workshopId,
      kind: 'password-reset',
      to: [{ name: user.name, address: user.email }],
      subject: words.subject,
      text: words.text,
      link: `${options.mail.publicUrl}/set-password?token=${token}`,
      createdBy: null,
      mail: options.mail,
      transaction,
    });
  });
}
