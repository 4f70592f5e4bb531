// A lead adds a person to their own workshop with a role and a first password.
import type { CreateStaffRequest } from '@heatpath/contracts';
import { UniqueConstraintError } from 'sequelize';
import { User } from '../../db/models/index';
import { conflict } from '../../errors';
import { hashPassword } from '../../lib/passwords';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';

export async function createStaffMember(options: {
  actor: Actor;
  input: CreateStaffRequest;
}): Promise<User> {
  assertCan(options.actor, 'staff.manage');
  const { email, name, role, password } = options.input;
  try {
    return await User.create({
      workshopId: options.actor.workshopId,
      email,
      name,
      role,
      passwordHash: await hashPassword(password),
    });
  } catch (error) {
    if (error instanceof UniqueConstraintError) {
      throw conflict('Someone already signs in with that e-mail address.');
    }
    throw error;
  }
}
