// GET /api/customers?q=, POST /api/customers.
import { Router } from 'express';
import { customerInputSchema } from '@heatpath/contracts';
import type { CustomerInput } from '@heatpath/contracts';
import { z } from 'zod';
import { actorOf } from '../../middlewares/authenticate';
import { requirePermission } from '../../middlewares/require-permission';
import { validate } from '../../middlewares/validate';
import { presentCustomer } from '../../presenters/vehicle.presenter';
import { createCustomer } from '../../services/customers/create-customer';
import { searchCustomers } from '../../services/customers/search-customers';

const customerQuerySchema = z.object({
  q: z.string().trim().min(2, 'Type at least two letters of the name.').max(60),
});

export function customersRouter() {
  const router = Router();

  router.get(
    '/',
    requirePermission('vehicles.read'),
    validate('query', customerQuerySchema),
    async (_req, res) => {
      const { q } = res.locals.query as { q: string };
      const customers = await searchCustomers({ actor: actorOf(res), q });
      res.json({ customers: customers.map(presentCustomer) });
    },
  );

  router.post(
    '/',
    requirePermission('vehicles.write'),
    validate('body', customerInputSchema),
    async (_req, res) => {
      const customer = await createCustomer({
        actor: actorOf(res),
        input: res.locals.body as CustomerInput,
      });
      res.status(201).json(presentCustomer(customer));
    },
  );

  return router;
}
