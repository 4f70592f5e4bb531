// GET /api/vehicles?q=, POST /api/vehicles, GET /api/vehicles/:vehicleId.
import { Router } from 'express';
import type { VehicleInput } from '@heatpath/contracts';
import { actorOf } from '../../middlewares/authenticate';
import { requirePermission } from '../../middlewares/require-permission';
import { validate } from '../../middlewares/validate';
import { presentVehicle } from '../../presenters/vehicle.presenter';
import { createVehicle } from '../../services/vehicles/create-vehicle';
import { findVehicles, getVehicle } from '../../services/vehicles/find-vehicles';
import {
  vehicleInputSchema,
  vehicleLookupQuerySchema,
  vehicleParamsSchema,
} from './vehicles.schema';

export function vehiclesRouter() {
  const router = Router();

  router.get(
    '/',
    requirePermission('vehicles.read'),
    validate('query', vehicleLookupQuerySchema),
    async (_req, res) => {
      const { q } = res.locals.query as { q: string };
      const vehicles = await findVehicles({ actor: actorOf(res), q });
      res.json({ vehicles: vehicles.map(presentVehicle) });
    },
  );

  router.post(
    '/',
    requirePermission('vehicles.write'),
    validate('body', vehicleInputSchema),
    async (_req, res) => {
      const actor = actorOf(res);
      const created = await createVehicle({ actor, input: res.locals.body as VehicleInput });
      const vehicle = await getVehicle({ actor, vehicleId: created.id });
      res.status(201).json(presentVehicle(vehicle));
    },
  );

  router.get(
    '/:vehicleId',
    requirePermission('vehicles.read'),
    validate('params', vehicleParamsSchema),
    async (_req, res) => {
      const { vehicleId } = res.locals.params as { vehicleId: string };
      res.json(presentVehicle(await getVehicle({ actor: actorOf(res), vehicleId })));
    },
  );

  return router;
}
