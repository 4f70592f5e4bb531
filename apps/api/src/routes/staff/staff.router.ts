// The lead's staff management: GET/POST /api/staff, PATCH /api/staff/:userId, and invitations
// by e-mail: POST /api/staff/invitations, POST /api/staff/:userId/invitation (send again).
import { Router } from 'express';
import type {
  CreateStaffRequest,
  InviteStaffRequest,
  UpdateStaffRequest,
} from '@heatpath/contracts';
import type { Config } from '../../config';
import type { MailContext } from '../../lib/mail/mail-context';
import { actorOf } from '../../middlewares/authenticate';
import { requirePermission } from '../../middlewares/require-permission';
import { validate } from '../../middlewares/validate';
import { presentStaffMember } from '../../presenters/staff-member.presenter';
import { createStaffMember } from '../../services/staff/create-staff-member';
import { inviteStaffMember } from '../../services/staff/invite-staff-member';
import { resendInvitation } from '../../services/staff/resend-invitation';
import { listStaff } from '../../services/staff/list-staff';
import { updateStaffMember } from '../../services/staff/update-staff-member';
import {
  createStaffRequestSchema,
  inviteStaffRequestSchema,
  staffParamsSchema,
  updateStaffRequestSchema,
} from './staff.schema';

export function staffRouter(deps: { config: Config; mail: MailContext }) {
  const router = Router();
  const ttlMinutes = deps.config.accountTokens.invitationTtlMinutes;
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

  router.post('/invitations', validate('body', inviteStaffRequestSchema), async (_req, res) => {
    const user = await inviteStaffMember({
      actor: actorOf(res),
      input: res.locals.body as InviteStaffRequest,
      ttlMinutes,
      mail: deps.mail,
    });
    res.status(201).json(presentStaffMember(user));
  });

  router.post('/:userId/invitation', validate('params', staffParamsSchema), async (_req, res) => {
    const { userId } = res.locals.params as { userId: string };
    const user = await resendInvitation({
      actor: actorOf(res),
      userId,
      ttlMinutes,
      mail: deps.mail,
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
