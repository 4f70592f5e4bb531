// Signing out ends that one session, for every API process at once. (Deactivation and a new
// password end all of a person's sessions in the database itself: migration 0007's trigger.)
import { Op } from 'sequelize';
import { Session } from '../../db/models/index';

export async function endSession(options: { sessionId: string; now: Date }): Promise<void> {
  await Session.update(
    { endedAt: options.now, endedReason: 'signed-out' },
    { where: { id: options.sessionId, endedAt: { [Op.is]: null } } },
  );
}
