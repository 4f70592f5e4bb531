// When guesses from unknown browsers pause sign-in to an account, its owner is e-mailed a
// single-use link (through the outbox) that lifts the pause. Sent once per pause.
import type { User } from '../../db/models/index';
import type { MailContext } from '../../lib/mail/mail-context';
import { enqueueMail } from '../mail/enqueue-mail';
import { issueAccountToken } from './account-tokens';
import { signInUnlockMessage } from './link-messages';
import { withTransaction } from '../../db/with-transaction';

export async function sendSignInUnlock(options: {
  user: User;
  ttlMinutes: number;
  mail: MailContext;
}): Promise<void> {
  const { user } = options;
  if (!user.workshop) throw new Error('sendSignInUnlock needs the workshop loaded.');
  const workshopName = user.workshop.name;
  await withTransaction(async (transaction) => {
    const { token } = await issueAccountToken({
      user,
      purpose: 'sign-in-unlock',
      ttlMinutes: options.ttlMinutes,
      createdBy: null,
      transaction,
    });
    const words = signInUnlockMessage({
      name: user.name,
      workshopName,
      ttlMinutes: options.ttlMinutes,
    });
    await enqueueMail({
      workshopId: user.workshopId,
      kind: 'sign-in-unlock',
      to: [{ name: user.name, address: user.email }],
      subject: words.subject,
      text: words.text,
      link: `${options.mail.publicUrl}/unlock?token=${token}`,
      createdBy: null,
      mail: options.mail,
      transaction,
    });
  });
}
