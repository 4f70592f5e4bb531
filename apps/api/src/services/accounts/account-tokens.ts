// Single-use, expiring tokens for invitations and password resets: 32 random bytes in the link,
// only their SHA-256 in the database. Issuing one spends the person's older open tokens of the
// same purpose, so only the newest link works.
import { createHash, randomBytes } from 'node:crypto';
import { Op } from 'sequelize';
import type { Transaction } from 'sequelize';
import { AccountToken } from '../../db/models/index';
import type { User } from '../../db/models/index';
import type { AccountTokenPurpose } from '../../db/models/account-token';

export const hashToken = (token: string): string =>
  createHash('sha256').update(token, 'utf8').digest('hex');

export async function issueAccountToken(options: {
  user: User;
  purpose: AccountTokenPurpose;
  ttlMinutes: number;
  createdBy: string | null;
  transaction: Transaction;
}): Promise<{ token: string; expiresAt: Date }> {
  const { user, purpose, transaction } = options;
  await AccountToken.update(
    { usedAt: new Date() },
    { where: { userId: user.id, purpose, usedAt: { [Op.is]: null } }, transaction },
  );
  const token = randomBytes(32).toString('base64url');
  const expiresAt = new Date(Date.now() + options.ttlMinutes * 60_000);
  await AccountToken.create(
    {
      userId: user.id,
      workshopId: user.workshopId,
      purpose,
      tokenHash: hashToken(token),
      expiresAt,
      createdBy: options.createdBy,
    },
    { transaction },
  );
  return { token, expiresAt };
}

export const tokenNoLongerValid =
  'This link no longer works: it was used already or has expired. Ask for a new one.';
