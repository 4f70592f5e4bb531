// The invented demo scenario: two workshops, so a newcomer can see that neither sees the
// other's data. Runs only on an empty database.
import type { Role } from '@heatpath/contracts';
import type { Sequelize } from 'sequelize';
import { Customer, User, Vehicle, Workshop } from '../models/index';
import { installShippedTrees } from '../../services/trees/install-shipped-trees';
import { hashPassword } from '../../lib/passwords';
import type { FileStore } from '../../lib/storage/file-store';
import { seedDemoCases } from './demo-cases';

export const demoPassword = 'heatpath-demo';

interface DemoVehicle {
  plate: string;
  vin: string | null;
  make: string;
  model: string;
  year: number;
  engine: string;
  fuel: 'petrol' | 'diesel' | 'hybrid';
  mileage: number;
  customer: { name: string; phone: string; email: string };
}

// Invented makes, models and people; plates follow no real country's scheme.
export const demoVehicles: Record<string, DemoVehicle[]> = {
  'Harbour Lane Garage': [
    {
      plate: 'HL17 KVR',
      vin: '1M8GDM9AXKP042788',
      make: 'Corvane',
      model: 'Tessel 1.4T',
      year: 2017,
      engine: '1.4 turbo petrol, switchable coolant pump',
      fuel: 'petrol',
      mileage: 118400,
      customer: {
        name: 'Morwenna Tregarth',
        phone: '01632 960111',
        email: 'morwenna.tregarth@example.test',
      },
    },
    {
      plate: 'HL19 DXA',
      vin: null,
      make: 'Brisa',
      model: 'Orlo Estate 2.0d',
      year: 2019,
      engine: '2.0 diesel with charge-air cooler loop',
      fuel: 'diesel',
      mileage: 164900,
      customer: { name: 'Jory Pascoe', phone: '01632 960245', email: 'jory.pascoe@example.test' },
    },
    {
      plate: 'HL15 MUB',
      vin: null,
      make: 'Halden',
      model: 'Vireo Hybrid',
      year: 2015,
      engine: '1.8 petrol hybrid, electric heater pump',
      fuel: 'hybrid',
      mileage: 201300,
      customer: { name: 'Senara Kitto', phone: '01632 960378', email: 'senara.kitto@example.test' },
    },
  ],
  'Millbrook Autos': [
    {
      plate: 'MB18 TQE',
      vin: null,
      make: 'Corvane',
      model: 'Strale 1.6',
      year: 2018,
      engine: '1.6 petrol',
      fuel: 'petrol',
      mileage: 87200,
      customer: {
        name: 'Ottilie Brand',
        phone: '01632 960401',
        email: 'ottilie.brand@example.test',
      },
    },
  ],
};

export const demoWorkshops: {
  name: string;
  people: { email: string; name: string; role: Role }[];
}[] = [
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
export async function seedDemo(sequelize: Sequelize, deps: { store: FileStore }): Promise<boolean> {
  const seeded = await seedDemoWorkshops(sequelize);
  // The finished cases go through the case services, each with its own transaction; the
  // photos their walks require are stored in `store`.
  if (seeded) await seedDemoCases(deps);
  return seeded;
}

async function seedDemoWorkshops(sequelize: Sequelize): Promise<boolean> {
  return sequelize.transaction(async (transaction) => {
    await sequelize.query('SELECT pg_advisory_xact_lock(734052)', { transaction });
    if ((await Workshop.count({ transaction })) > 0) return false;
    const passwordHash = await hashPassword(demoPassword);
    for (const w of demoWorkshops) {
      const workshop = await Workshop.create({ name: w.name }, { transaction });
      let leadId: string | null = null;
      for (const p of w.people) {
        const user = await User.create(
          { ...p, workshopId: workshop.id, passwordHash },
          { transaction },
        );
        if (p.role === 'lead') leadId = user.id;
      }
      await installShippedTrees({ workshopId: workshop.id, userId: leadId, transaction });
      for (const v of demoVehicles[w.name] ?? []) {
        const customer = await Customer.create(
          { workshopId: workshop.id, ...v.customer },
          { transaction },
        );
        const plateKey = v.plate.replace(/\s/g, '');
        await Vehicle.create(
          {
            workshopId: workshop.id,
            customerId: customer.id,
            plate: v.plate,
            plateKey,
            vin: v.vin,
            make: v.make,
            model: v.model,
            year: v.year,
            engine: v.engine,
            fuel: v.fuel,
            mileage: v.mileage,
          },
          { transaction },
        );
      }
    }
    return true;
  });
}
