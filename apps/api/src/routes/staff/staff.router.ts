// The lead's staff management: GET/POST /api/staff, PATCH /api/staff/:userId.
import { Router } from 'express';
import type { CreateStaffRequest, UpdateStaffRequest } from '@heatpath/contracts';
import { actorOf } from '../../middlewares/authenticate';
import { requirePermission } from '../../middlewares/require-permission';
import { validate } from '../../middlewares/validate';
import { presentStaffMember } from '../../presenters/staff-member.presenter';
import { createStaffMember } from '../../services/staff/create-staff-member';
import { listStaff } from '../../services/staff/list-staff';
import { updateStaffMember } from '../../services/staff/update-staff-member';
import {
  createStaffRequestSchema,
  staffParamsSchema,
  updateStaffRequestSchema,
} from './staff.schema';

export function staffRouter() {
  const router = Router();
  router.use(requirePermission('staff.manage'));

  router.get('/', async (_req, res) => {
    const staff = await listStaff({ actor: actorOf(res) });
    res.json({ staff: staff.map(presentStaffMember) });
  });

  router.post('/', validate('body', createStaffRequestSchema), async (_req, res) => {
    const user = await createStaffMember({
      actor: actorOf(res),
      input: res.locals.body as CreateStaffRequest,
    });
    res.status(201).json(presentStaffMember(user));
  });

  router.patch(
    '/:userId',
    validate('params', staffParamsSchema),
    validate('body', updateStaffRequestSchema),
    async (_req, res) => {
      const { userId } = res.locals.params as { userId: string };
      const user = await updateStaffMember({
        actor: actorOf(res),
        userId,
        changes: res.locals.body as UpdateStaffRequest,
      });
      res.json(presentStaffMember(user));
    },
  );

  return router;
}
