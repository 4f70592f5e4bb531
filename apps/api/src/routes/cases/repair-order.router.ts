// /api/cases/:caseId/findings/…: the repair order of a diagnosed case — the review with every
// revision, approving one, downloading an approved one as PDF, CSV or JSON, and e-mailing it.
// (Saving an edit is PUT /api/cases/:caseId/findings, in cases.router.ts.)
import { Router } from 'express';
import type { ApproveFindingsRequest, SendRepairOrderRequest } from '@heatpath/contracts';
import type { MailContext } from '../../lib/mail/mail-context';
import type { FileStore } from '../../lib/storage/file-store';
import { actorOf } from '../../middlewares/authenticate';
import { requirePermission } from '../../middlewares/require-permission';
import { validate } from '../../middlewares/validate';
import { presentRepairOrderSend } from '../../presenters/repair-order.presenter';
import { approveFindingsRevision } from '../../services/repair-orders/approve-findings-revision';
import { exportRepairOrder } from '../../services/repair-orders/export-repair-order';
import { getRepairOrderReview } from '../../services/repair-orders/get-repair-order-review';
import { sendRepairOrder } from '../../services/repair-orders/send-repair-order';
import {
  approveFindingsRequestSchema,
  exportParamsSchema,
  exportQuerySchema,
  sendRepairOrderRequestSchema,
} from './cases.schema';

export function repairOrderRouter(deps: { store: FileStore; mail: MailContext }) {
  const router = Router({ mergeParams: true });
  const caseId = (res: { locals: Record<string, unknown> }) =>
    (res.locals.params as { caseId: string }).caseId;

  router.get('/review', requirePermission('findings.review'), async (_req, res) => {
    res.json(await getRepairOrderReview({ actor: actorOf(res), caseId: caseId(res) }));
  });

  router.post(
    '/approve',
    requirePermission('findings.review'),
    validate('body', approveFindingsRequestSchema),
    async (_req, res) => {
      const actor = actorOf(res);
      const { revision } = res.locals.body as ApproveFindingsRequest;
      await approveFindingsRevision({ actor, caseId: caseId(res), revision });
      res.json(await getRepairOrderReview({ actor, caseId: caseId(res) }));
    },
  );

  router.get(
    '/export/:format',
    requirePermission('findings.review'),
    validate('params', exportParamsSchema),
    validate('query', exportQuerySchema),
    async (_req, res) => {
      const { format } = res.locals.params as { format: 'pdf' | 'csv' | 'json' };
      const { revision } = res.locals.query as { revision?: number };
      const file = await exportRepairOrder({
        actor: actorOf(res),
        caseId: caseId(res),
        revision,
        format,
        store: deps.store,
      });
      res.set('Content-Type', file.mediaType);
      res.set('Content-Disposition', `attachment; filename="${file.filename}"`);
      res.set('X-Content-Type-Options', 'nosniff');
      res.send(file.content);
    },
  );

  router.post(
    '/send',
    requirePermission('findings.review'),
    validate('body', sendRepairOrderRequestSchema),
    async (_req, res) => {
      const message = await sendRepairOrder({
        actor: actorOf(res),
        caseId: caseId(res),
        input: res.locals.body as SendRepairOrderRequest,
        store: deps.store,
        mail: deps.mail,
      });
      res.status(201).json(presentRepairOrderSend(message));
    },
  );

  return router;
}
