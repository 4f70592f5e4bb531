// GET /api/customers?q=, POST /api/customers.
import { Router } from 'express';
import { customerInputSchema } from '@heatpath/contracts';
import { z } from 'zod';
import { actorOf } from '../../middlewares/authenticate';
import { requirePermission } from '../../middlewares/require-permission';
import { presentCustomer } from '../../presenters/vehicle.presenter';
import { createCustomer } from '../../services/customers/create-customer';
import { searchCustomers } from '../../services/customers/search-customers';
import { typedRoute } from '../typed-route';

const customerQuerySchema = z.object({
  q: z.string().trim().min(2, 'Type at least two letters of the name.').max(60),
});

export function customersRouter() {
  const router = Router();

  router.get(
    '/',
    requirePermission('vehicles.read'),
    typedRoute({ query: customerQuerySchema }, async ({ query }, res) => {
      const customers = await searchCustomers({ actor: actorOf(res), q: query.q });
      res.json({ customers: customers.map(presentCustomer) });
    }),
  );

  router.post(
    '/',
    requirePermission('vehicles.write'),
    typedRoute({ body: customerInputSchema }, async ({ body }, res) => {
      const customer = await createCustomer({ actor: actorOf(res), input: body });
      res.status(201).json(presentCustomer(customer));
    }),
  );

  return router;
}
