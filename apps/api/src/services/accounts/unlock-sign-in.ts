// Opens the link from a "sign-in was paused" e-mail: spends the token (one conditional UPDATE,
// so it works once) and lifts the pause on the account for unknown browsers.
import { QueryTypes } from 'sequelize';
import { User } from '../../db/models/index';
import { AppError } from '../../errors';
import { allowanceKeys, clearAllowance } from '../auth/sign-in-allowance';
import { hashToken, tokenNoLongerValid } from './account-tokens';
import { database, withTransaction } from '../../db/with-transaction';

export async function unlockSignIn(options: { token: string }): Promise<void> {
  await withTransaction(async (transaction) => {
    const spent = await database().query<{ user_id: string }>(
      `UPDATE account_tokens SET used_at = now()
        WHERE token_hash = $1 AND purpose = 'sign-in-unlock' AND used_at IS NULL
          AND expires_at > now()
      RETURNING user_id`,
      { bind: [hashToken(options.token)], type: QueryTypes.SELECT, transaction },
    );
    const userId = spent[0]?.user_id;
    const user = userId
      ? await User.findOne({ where: { id: userId, active: true }, transaction })
      : null;
    if (!user) throw new AppError('not_found', tokenNoLongerValid);
    await clearAllowance(allowanceKeys.account(user.email), transaction);
  });
}
