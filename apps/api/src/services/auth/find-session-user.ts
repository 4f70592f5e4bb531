// Resolves a session to its person, re-read on every request so a role change or a
// deactivation takes effect at once.
import { User, Workshop } from '../../db/models/index';

export async function findSessionUser(options: {
  userId: string;
  workshopId: string;
}): Promise<User | null> {
  const user = await User.findOne({
    where: { id: options.userId, workshopId: options.workshopId, active: true },
    include: [{ model: Workshop, as: 'workshop' }],
  });
  return user;
}
