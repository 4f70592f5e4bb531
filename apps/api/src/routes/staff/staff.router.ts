// The lead's staff management: GET/POST /api/staff, PATCH /api/staff/:userId, and invitations
// by e-mail: POST /api/staff/invitations, POST /api/staff/:userId/invitation (send again).
import { Router } from 'express';
import type { Config } from '../../config';
import type { MailContext } from '../../lib/mail/mail-context';
import { actorOf } from '../../middlewares/authenticate';
import { requirePermission } from '../../middlewares/require-permission';
import { presentStaffMember } from '../../presenters/staff-member.presenter';
import { createStaffMember } from '../../services/staff/create-staff-member';
import { inviteStaffMember } from '../../services/staff/invite-staff-member';
import { resendInvitation } from '../../services/staff/resend-invitation';
import { listStaff } from '../../services/staff/list-staff';
import { updateStaffMember } from '../../services/staff/update-staff-member';
import { typedRoute } from '../typed-route';
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

  router.post(
    '/',
    typedRoute({ body: createStaffRequestSchema }, async ({ body }, res) => {
      const user = await createStaffMember({ actor: actorOf(res), input: body });
      res.status(201).json(presentStaffMember(user));
    }),
  );

  router.post(
    '/invitations',
    typedRoute({ body: inviteStaffRequestSchema }, async ({ body }, res) => {
      const user = await inviteStaffMember({
        actor: actorOf(res),
        input: body,
        ttlMinutes,
        mail: deps.mail,
      });
      res.status(201).json(presentStaffMember(user));
    }),
  );

  router.post(
    '/:userId/invitation',
    typedRoute({ params: staffParamsSchema }, async ({ params }, res) => {
      const user = await resendInvitation({
        actor: actorOf(res),
        userId: params.userId,
        ttlMinutes,
        mail: deps.mail,
      });
      res.status(201).json(presentStaffMember(user));
    }),
  );

  router.patch(
    '/:userId',
    typedRoute(
      { params: staffParamsSchema, body: updateStaffRequestSchema },
      async ({ params, body }, res) => {
        const user = await updateStaffMember({
          actor: actorOf(res),
          userId: params.userId,
          changes: body,
        });
        res.json(presentStaffMember(user));
      },
    ),
  );

  return router;
}
