// Checks an e-mail and password; one generic failure whatever was wrong.
import { User, Workshop } from '../../db/models/index';
import { AppError } from '../../errors';
import { verifyPassword } from '../../lib/passwords';

export const signInFailedMessage = 'That e-mail and password do not match an active account.';

export async function signInUser(options: { email: string; password: string }): Promise<User> {
  const user = await User.findOne({
    where: { email: options.email.toLowerCase() },
    include: [{ model: Workshop, as: 'workshop' }],
  });
  const matches = await verifyPassword(options.password, user?.passwordHash ?? null);
  if (!user || !matches || !user.active) throw new AppError('unauthenticated', signInFailedMessage);
  await user.update({ lastSignInAt: new Date() });
  return user;
}
