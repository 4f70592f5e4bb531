// Adds a vehicle to the caller's workshop, refusing a second record for the same VIN or plate.
import type { VehicleInput } from '@heatpath/contracts';
import { plateKey } from '@heatpath/contracts';
import { Op, UniqueConstraintError } from 'sequelize';
import { Vehicle } from '../../db/models/index';
import { conflict } from '../../errors';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { findCustomer } from '../customers/find-customer';

export async function createVehicle(options: { actor: Actor; input: VehicleInput }) {
  const { actor, input } = options;
  assertCan(actor, 'vehicles.write');
  const key = input.plate ? plateKey(input.plate) : null;
  const clash = await Vehicle.findOne({
    where: {
      workshopId: actor.workshopId,
      [Op.or]: [...(input.vin ? [{ vin: input.vin }] : []), ...(key ? [{ plateKey: key }] : [])],
    },
  });
  if (clash) {
    const by = input.vin && clash.vin === input.vin ? 'VIN' : 'plate';
    throw conflict(
      `A vehicle with this ${by} is already on file (${clash.make} ${clash.model}); use that one.`,
    );
  }
  if (input.customerId) await findCustomer({ actor, customerId: input.customerId });
  try {
    return await Vehicle.create({
      workshopId: actor.workshopId,
      customerId: input.customerId ?? null,
      vin: input.vin ?? null,
      plate: input.plate ? input.plate.toUpperCase() : null,
      plateKey: key,
      make: input.make,
      model: input.model,
      year: input.year ?? null,
      engine: input.engine ?? null,
      fuel: input.fuel ?? null,
      mileage: input.mileage ?? null,
      mileageUnit: input.mileageUnit,
    });
  } catch (error) {
    // Two intakes of the same car at once: the unique index decides.
    if (error instanceof UniqueConstraintError)
      throw conflict('A vehicle with this VIN or plate is already on file; use that one.');
    throw error;
  }
}
