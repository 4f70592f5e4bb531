// Adds a customer to the caller's workshop.
import type { CustomerInput } from '@heatpath/contracts';
import type { Transaction } from 'sequelize';
import { Customer } from '../../db/models/index';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';

export async function createCustomer(options: {
  actor: Actor;
  input: CustomerInput;
  transaction?: Transaction;
}) {
  assertCan(options.actor, 'vehicles.write');
  const { name, phone, email } = options.input;
  return Customer.create(
    { workshopId: options.actor.workshopId, name, phone: phone ?? null, email: email ?? null },
    { transaction: options.transaction },
  );
}
