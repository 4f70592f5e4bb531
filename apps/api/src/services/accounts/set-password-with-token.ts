// Sets a password from an invitation or reset link. The token is spent by one conditional
// UPDATE (unused and unexpired), so two tabs racing with the same link cannot both succeed;
// every other open link of the person stops working too. The new password ends every session
// and forgets every browser of the person (migration 0007's trigger), and, since the link
// proved the mailbox, lifts a pause on sign-in from unknown browsers.
import { Op, QueryTypes } from 'sequelize';
import { AccountToken, User, Workshop } from '../../db/models/index';
import { AppError } from '../../errors';
import { hashPassword } from '../../lib/passwords';
import { allowanceKeys, clearAllowance } from '../auth/sign-in-allowance';
import { hashToken, tokenNoLongerValid } from './account-tokens';
import { database, withTransaction } from '../../db/with-transaction';

export async function setPasswordWithToken(options: {
  token: string;
  password: string;
}): Promise<User> {
  const passwordHash = await hashPassword(options.password);
  return withTransaction(async (transaction) => {
    const spent = await database().query<{ user_id: string }>(
      `UPDATE account_tokens SET used_at = now()
        WHERE token_hash = $1 AND purpose IN ('invitation', 'password-reset')
          AND used_at IS NULL AND expires_at > now()
      RETURNING user_id`,
      { bind: [hashToken(options.token)], type: QueryTypes.SELECT, transaction },
    );
    const userId = spent[0]?.user_id;
    const user = userId
      ? await User.findOne({
          where: { id: userId, active: true },
          include: [{ model: Workshop, as: 'workshop' }],
          transaction,
          lock: { level: transaction.LOCK.UPDATE, of: User },
        })
      : null;
    if (!user) throw new AppError('not_found', tokenNoLongerValid);
    await user.update({ passwordHash }, { transaction });
    await AccountToken.update(
      { usedAt: new Date() },
      { where: { userId: user.id, usedAt: { [Op.is]: null } }, transaction },
    );
    await clearAllowance(allowanceKeys.account(user.email), transaction);
    return user;
  });
}
