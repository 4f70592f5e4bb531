// Resolves a session to its person, re-read on every request so that signing out, a new
// password, a deactivation or a role change takes effect at once in every API process.
import { Op } from 'sequelize';
import { Session, User, Workshop } from '../../db/models/index';

export async function findSessionUser(options: {
  sessionId: string;
  userId: string;
  workshopId: string;
  now: Date;
}): Promise<User | null> {
  const session = await Session.findOne({
    where: {
      id: options.sessionId,
      userId: options.userId,
      workshopId: options.workshopId,
      endedAt: { [Op.is]: null },
      expiresAt: { [Op.gt]: options.now },
    },
    include: [
      {
        model: User,
        as: 'user',
        where: { active: true, workshopId: options.workshopId },
        include: [{ model: Workshop, as: 'workshop' }],
      },
    ],
  });
  return session?.user ?? null;
}
