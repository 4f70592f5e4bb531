// What the set-password page shows before the person types: whose link it is and for what.
// Reading it does not use it up.
import type { AccountTokenInfo } from '@heatpath/contracts';
import { Op } from 'sequelize';
import { AccountToken, User, Workshop } from '../../db/models/index';
import { AppError } from '../../errors';
import { hashToken, tokenNoLongerValid } from './account-tokens';

export async function findAccountToken(options: { token: string }): Promise<AccountTokenInfo> {
  const row = await AccountToken.findOne({
    where: {
      tokenHash: hashToken(options.token),
      // An unlock link is not a set-password link.
      purpose: ['invitation', 'password-reset'],
      usedAt: { [Op.is]: null },
      expiresAt: { [Op.gt]: new Date() },
    },
    include: [
      {
        model: User,
        as: 'user',
        where: { active: true },
        include: [{ model: Workshop, as: 'workshop' }],
      },
    ],
  });
  const user = row?.user;
  if (!row || !user?.workshop) throw new AppError('not_found', tokenNoLongerValid);
  if (row.purpose === 'sign-in-unlock') throw new AppError('not_found', tokenNoLongerValid);
  return {
    purpose: row.purpose,
    name: user.name,
    email: user.email,
    workshopName: user.workshop.name,
    expiresAt: row.expiresAt.toISOString(),
  };
}
