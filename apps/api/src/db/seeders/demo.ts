// The invented demo scenario: two workshops, so a newcomer can see that neither sees the
// other's data. Runs only on an empty database.
import type { Role } from '@heatpath/contracts';
import type { Sequelize } from 'sequelize';
import { User, Workshop } from '../models/index';
import { hashPassword } from '../../lib/passwords';

export const demoPassword = 'heatpath-demo';

export const demoWorkshops: { name: string; people: { email: string; name: string; role: Role }[] }[] = [
  {
    name: 'Harbour Lane Garage',
    people: [
      { email: 'lead@harbourlane.test', name: 'Rosa Penhallow', role: 'lead' },
      { email: 'tech@harbourlane.test', name: 'Dev Okonkwo-Hale', role: 'technician' },
      { email: 'apprentice@harbourlane.test', name: 'Kit Marrow', role: 'apprentice' },
      { email: 'advisor@harbourlane.test', name: 'Priya Tallis', role: 'advisor' },
    ],
  },
  {
    name: 'Millbrook Autos',
    people: [{ email: 'lead@millbrook.test', name: 'Aled Fenwick', role: 'lead' }],
  },
];

/** Seed the demo when no workshop exists yet; returns whether it seeded. */
export async function seedDemo(sequelize: Sequelize): Promise<boolean> {
  return sequelize.transaction(async (transaction) => {
    await sequelize.query('SELECT pg_advisory_xact_lock(734052)', { transaction });
    if ((await Workshop.count({ transaction })) > 0) return false;
    const passwordHash = await hashPassword(demoPassword);
    for (const w of demoWorkshops) {
      const workshop = await Workshop.create({ name: w.name }, { transaction });
      for (const p of w.people) {
        await User.create({ ...p, workshopId: workshop.id, passwordHash }, { transaction });
      }
    }
    return true;
  });
}
