// Starts a session for a person who has just proved who they are, and clears away their
// sessions that expired long ago, so the table holds roughly what is in use.
import { Op } from 'sequelize';
import { Session } from '../../db/models/index';

const keepExpiredMs = 24 * 3600 * 1000;

export async function startSession(options: {
  userId: string;
  workshopId: string;
  ttlMs: number;
  now: Date;
}): Promise<Session> {
  const { userId, workshopId, now } = options;
  await Session.destroy({
    where: { userId, expiresAt: { [Op.lt]: new Date(now.getTime() - keepExpiredMs) } },
  });
  return Session.create({
    userId,
    workshopId,
    createdAt: now,
    expiresAt: new Date(now.getTime() + options.ttlMs),
  });
}
