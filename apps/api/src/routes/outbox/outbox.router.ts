// /api/outbox: every e-mail Heatpath has written, with its status, for the lead; a file sent
// with one; and sending once more a message Heatpath gave up on.
import { Router } from 'express';
import { actorOf } from '../../middlewares/authenticate';
import { requirePermission } from '../../middlewares/require-permission';
import { validate } from '../../middlewares/validate';
import { presentOutboxMessage } from '../../presenters/outbox.presenter';
import { getOutboxAttachment } from '../../services/outbox/get-outbox-attachment';
import { listOutbox } from '../../services/outbox/list-outbox';
import { retryOutboxMessage } from '../../services/outbox/retry-outbox-message';
import {
  outboxAttachmentParamsSchema,
  outboxListQuerySchema,
  outboxMessageParamsSchema,
} from './outbox.schema';

export function outboxRouter() {
  const router = Router();

  router.get(
    '/',
    requirePermission('outbox.read'),
    validate('query', outboxListQuerySchema),
    async (_req, res) => {
      const page = await listOutbox({
        actor: actorOf(res),
        query: res.locals.query as { cursor?: string; limit: number },
      });
      res.json({ messages: page.messages.map(presentOutboxMessage), nextCursor: page.nextCursor });
    },
  );

  router.get(
    '/:messageId/attachments/:attachmentId',
    requirePermission('outbox.read'),
    validate('params', outboxAttachmentParamsSchema),
    async (_req, res) => {
      const { messageId, attachmentId } = res.locals.params as {
        messageId: string;
        attachmentId: string;
      };
      const file = await getOutboxAttachment({ actor: actorOf(res), messageId, attachmentId });
      res.set('Content-Type', file.mediaType);
      res.set(
        'Content-Disposition',
        `attachment; filename="${file.filename.replace(/[^\w.-]+/g, '_')}"`,
      );
      res.set('X-Content-Type-Options', 'nosniff');
      res.send(file.content);
    },
  );

  router.post(
    '/:messageId/retry',
    requirePermission('outbox.manage'),
    validate('params', outboxMessageParamsSchema),
    async (_req, res) => {
      const { messageId } = res.locals.params as { messageId: string };
      const message = await retryOutboxMessage({ actor: actorOf(res), messageId });
      res.json(presentOutboxMessage(message));
    },
  );

  return router;
}
