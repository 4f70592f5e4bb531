// Factories: every test makes its own workshop with its own people, so tests never share rows
// and never need truncating.
import { randomUUID } from 'node:crypto';
import type { Role } from '@heatpath/contracts';
import { roles } from '@heatpath/contracts';
import { Customer, Tree, User, Vehicle, Workshop } from '../db/models/index';
import { installShippedTrees } from '../services/trees/install-shipped-trees';
import { hashPassword } from '../lib/passwords';

export const testPassword = 'correct-horse-battery';
let cachedHash: Promise<string> | null = null;
const passwordHash = () => (cachedHash ??= hashPassword(testPassword));

export interface TestWorkshop {
  workshop: Workshop;
  people: Record<Role, User>;
}

export async function createUser(
  workshopId: string,
  role: Role,
  extra: Partial<{ name: string; active: boolean }> = {},
) {
  const tag = randomUUID().slice(0, 8);
  return User.create({
    workshopId,
    role,
    email: `${role}-${tag}@factory.test`,
    name: extra.name ?? `Test ${role} ${tag}`,
    passwordHash: await passwordHash(),
    active: extra.active ?? true,
  });
}

/** A fresh workshop with one person in every role. */
export async function createWorkshop(
  name = `Workshop ${randomUUID().slice(0, 8)}`,
): Promise<TestWorkshop> {
  const workshop = await Workshop.create({ name });
  const people = {} as Record<Role, User>;
  for (const role of roles) people[role] = await createUser(workshop.id, role);
  return { workshop, people };
}

/** A workshop that also has the shipped trees, published as version 1. */
export async function createWorkshopWithTrees(): Promise<
  TestWorkshop & { trees: Record<string, string> }
> {
  const w = await createWorkshop();
  await installShippedTrees({ workshopId: w.workshop.id, userId: w.people.lead.id });
  const trees = await Tree.findAll({ where: { workshopId: w.workshop.id } });
  return { ...w, trees: Object.fromEntries(trees.map((t) => [t.key, t.id])) };
}

export async function createVehicle(workshopId: string) {
  const customer = await Customer.create({
    workshopId,
    name: `Customer ${randomUUID().slice(0, 6)}`,
    phone: null,
    email: null,
  });
  const plate = `F${randomUUID().slice(0, 6).toUpperCase()}`;
  return Vehicle.create({
    workshopId,
    customerId: customer.id,
    plate,
    plateKey: plate,
    vin: null,
    make: 'Corvane',
    model: 'Tessel',
    year: 2016,
    engine: '1.4 petrol',
    fuel: 'petrol',
    mileage: 120000,
  });
}
