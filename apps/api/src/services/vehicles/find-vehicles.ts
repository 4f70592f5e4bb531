// Finds the caller's workshop's vehicles by the start of a plate or VIN, so an intake finds the
// car before it creates a duplicate.
import { Op } from 'sequelize';
import { normaliseVin, plateKey } from '@heatpath/contracts';
import { Customer, Vehicle } from '../../db/models/index';
import { notFound } from '../../errors';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';

const escapeLike = (s: string) => s.replace(/[%_\\]/g, '\\$&');

export async function findVehicles(options: { actor: Actor; q: string }) {
  assertCan(options.actor, 'vehicles.read');
  const plate = escapeLike(plateKey(options.q));
  const vin = escapeLike(normaliseVin(options.q));
  return Vehicle.findAll({
    where: {
      workshopId: options.actor.workshopId,
      [Op.or]: [{ plateKey: { [Op.like]: `${plate}%` } }, { vin: { [Op.like]: `${vin}%` } }],
    },
    include: [{ model: Customer, as: 'customer' }],
    order: [['updatedAt', 'DESC']],
    limit: 10,
  });
}

export async function getVehicle(options: { actor: Actor; vehicleId: string }) {
  assertCan(options.actor, 'vehicles.read');
  const vehicle = await Vehicle.findOne({
    where: { id: options.vehicleId, workshopId: options.actor.workshopId },
    include: [{ model: Customer, as: 'customer' }],
  });
  if (!vehicle) throw notFound('That vehicle');
  return vehicle;
}
