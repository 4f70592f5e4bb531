// GET /api/vehicles?q=, POST /api/vehicles, GET /api/vehicles/:vehicleId.
import { Router } from 'express';
import { actorOf } from '../../middlewares/authenticate';
import { requirePermission } from '../../middlewares/require-permission';
import { presentVehicle } from '../../presenters/vehicle.presenter';
import { createVehicle } from '../../services/vehicles/create-vehicle';
import { findVehicles, getVehicle } from '../../services/vehicles/find-vehicles';
import { typedRoute } from '../typed-route';
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
    typedRoute({ query: vehicleLookupQuerySchema }, async ({ query }, res) => {
      const vehicles = await findVehicles({ actor: actorOf(res), q: query.q });
      res.json({ vehicles: vehicles.map(presentVehicle) });
    }),
  );

  router.post(
    '/',
    requirePermission('vehicles.write'),
    typedRoute({ body: vehicleInputSchema }, async ({ body }, res) => {
      const actor = actorOf(res);
      const created = await createVehicle({ actor, input: body });
      const vehicle = await getVehicle({ actor, vehicleId: created.id });
      res.status(201).json(presentVehicle(vehicle));
    }),
  );

  router.get(
    '/:vehicleId',
    requirePermission('vehicles.read'),
    typedRoute({ params: vehicleParamsSchema }, async ({ params }, res) => {
      const vehicle = await getVehicle({ actor: actorOf(res), vehicleId: params.vehicleId });
      res.json(presentVehicle(vehicle));
    }),
  );

  return router;
}
