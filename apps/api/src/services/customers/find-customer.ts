// Loads one customer of the caller's workshop, or 404.
import type { Transaction } from 'sequelize';
import { Customer } from '../../db/models/index';
import { notFound } from '../../errors';
import type { Actor } from '../../policies/permissions';

export async function findCustomer(options: {
  actor: Actor;
  customerId: string;
  transaction?: Transaction;
}) {
  const customer = await Customer.findOne({
    where: { id: options.customerId, workshopId: options.actor.workshopId },
    transaction: options.transaction,
  });
  if (!customer) throw notFound('That customer');
  return customer;
}
