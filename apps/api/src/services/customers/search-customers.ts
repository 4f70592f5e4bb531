// Customers of the caller's workshop whose name starts with (or contains) the typed text.
import { Op } from 'sequelize';
import { Customer } from '../../db/models/index';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';

export async function searchCustomers(options: { actor: Actor; q: string }) {
  assertCan(options.actor, 'vehicles.read');
  return Customer.findAll({
    where: {
      workshopId: options.actor.workshopId,
      name: { [Op.iLike]: `%${options.q.replace(/[%_\\]/g, '\\$&')}%` },
    },
    order: [['name', 'ASC']],
    limit: 10,
  });
}
