// /api/cases/:caseId/findings/…: the repair order of a diagnosed case — the review with every
// revision, approving one, downloading an approved one as PDF, CSV or JSON, and e-mailing it.
// (Saving an edit is PUT /api/cases/:caseId/findings, in cases.router.ts.)
import { Router } from 'express';
import type { MailContext } from '../../lib/mail/mail-context';
import type { FileStore } from '../../lib/storage/file-store';
import { actorOf } from '../../middlewares/authenticate';
import { requirePermission } from '../../middlewares/require-permission';
import { presentRepairOrderSend } from '../../presenters/repair-order.presenter';
import { approveFindingsRevision } from '../../services/repair-orders/approve-findings-revision';
import { exportRepairOrder } from '../../services/repair-orders/export-repair-order';
import { getRepairOrderReview } from '../../services/repair-orders/get-repair-order-review';
import { sendRepairOrder } from '../../services/repair-orders/send-repair-order';
import {
  approveFindingsRequestSchema,
  caseParamsSchema,
  exportParamsSchema,
  exportQuerySchema,
  sendRepairOrderRequestSchema,
} from './cases.schema';
import { typedRoute } from '../typed-route';

export function repairOrderRouter(deps: { store: FileStore; mail: MailContext }) {
  const router = Router({ mergeParams: true });

  router.get(
    '/review',
    requirePermission('findings.review'),
    typedRoute({ params: caseParamsSchema }, async ({ params: { caseId } }, res) => {
      res.json(await getRepairOrderReview({ actor: actorOf(res), caseId }));
    }),
  );

  router.post(
    '/approve',
    requirePermission('findings.review'),
    typedRoute(
      { params: caseParamsSchema, body: approveFindingsRequestSchema },
      async ({ params: { caseId }, body: { revision } }, res) => {
        const actor = actorOf(res);
        await approveFindingsRevision({ actor, caseId, revision });
        res.json(await getRepairOrderReview({ actor, caseId }));
      },
    ),
  );

  router.get(
    '/export/:format',
    requirePermission('findings.review'),
    typedRoute(
      { params: exportParamsSchema, query: exportQuerySchema },
      async ({ params: { caseId, format }, query: { revision } }, res) => {
        const file = await exportRepairOrder({
          actor: actorOf(res),
          caseId,
          revision,
          format,
          store: deps.store,
        });
        res.set('Content-Type', file.mediaType);
        res.set('Content-Disposition', `attachment; filename="${file.filename}"`);
        res.set('X-Content-Type-Options', 'nosniff');
        res.send(file.content);
      },
    ),
  );

  router.post(
    '/send',
    requirePermission('findings.review'),
    typedRoute(
      { params: caseParamsSchema, body: sendRepairOrderRequestSchema },
      async ({ params: { caseId }, body }, res) => {
        const message = await sendRepairOrder({
          actor: actorOf(res),
          caseId,
          input: body,
          store: deps.store,
          mail: deps.mail,
        });
        res.status(201).json(presentRepairOrderSend(message));
      },
    ),
  );

  return router;
}
