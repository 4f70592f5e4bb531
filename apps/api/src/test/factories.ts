// Factories: every test makes its own workshop with its own people, so tests never share rows
// and never need truncating.
import { randomUUID } from 'node:crypto';
import type { Role } from '@heatpath/contracts';
import { roles } from '@heatpath/contracts';
import { User, Workshop } from '../db/models/index';
import { hashPassword } from '../lib/passwords';

export const testPassword = 'correct-horse-battery';
let cachedHash: Promise<string> | null = null;
const passwordHash = () => (cachedHash ??= hashPassword(testPassword));

export interface TestWorkshop {
  workshop: Workshop;
  people: Record<Role, User>;
}

export async function createUser(workshopId: string, role: Role, extra: Partial<{ name: string; active: boolean }> = {}) {
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
export async function createWorkshop(name = `Workshop ${randomUUID().slice(0, 8)}`): Promise<TestWorkshop> {
  const workshop = await Workshop.create({ name });
  const people = {} as Record<Role, User>;
  for (const role of roles) people[role] = await createUser(workshop.id, role);
  return { workshop, people };
}
