// /api/outbox: every e-mail Heatpath has written, with its status, for the lead; a file sent
// with one; and sending once more a message Heatpath gave up on.
import { Router } from 'express';
import { actorOf } from '../../middlewares/authenticate';
import { requirePermission } from '../../middlewares/require-permission';
import { presentOutboxMessage } from '../../presenters/outbox.presenter';
import { getOutboxAttachment } from '../../services/outbox/get-outbox-attachment';
import { listOutbox } from '../../services/outbox/list-outbox';
import { retryOutboxMessage } from '../../services/outbox/retry-outbox-message';
import {
  outboxAttachmentParamsSchema,
  outboxListQuerySchema,
  outboxMessageParamsSchema,
} from './outbox.schema';
import { typedRoute } from '../typed-route';

export function outboxRouter() {
  const router = Router();

  router.get(
    '/',
    requirePermission('outbox.read'),
    typedRoute({ query: outboxListQuerySchema }, async ({ query }, res) => {
      const page = await listOutbox({ actor: actorOf(res), query });
      res.json({ messages: page.messages.map(presentOutboxMessage), nextCursor: page.nextCursor });
    }),
  );

  router.get(
    '/:messageId/attachments/:attachmentId',
    requirePermission('outbox.read'),
    typedRoute({ params: outboxAttachmentParamsSchema }, async ({ params }, res) => {
      const { messageId, attachmentId } = params;
      const file = await getOutboxAttachment({ actor: actorOf(res), messageId, attachmentId });
      res.set('Content-Type', file.mediaType);
      res.set(
        'Content-Disposition',
        `attachment; filename="${file.filename.replace(/[^\w.-]+/g, '_')}"`,
      );
      res.set('X-Content-Type-Options', 'nosniff');
      res.send(file.content);
    }),
  );

  router.post(
    '/:messageId/retry',
    requirePermission('outbox.manage'),
    typedRoute({ params: outboxMessageParamsSchema }, async ({ params }, res) => {
      const message = await retryOutboxMessage({
        actor: actorOf(res),
        messageId: params.messageId,
      });
      res.json(presentOutboxMessage(message));
    }),
  );

  return router;
}
