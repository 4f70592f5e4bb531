// Request shapes for /api/outbox.
import { z } from 'zod';

export { outboxListQuerySchema } from '@heatpath/contracts';

export const outboxMessageParamsSchema = z.object({
  messageId: z.uuid({ error: 'That is not a valid message id.' }),
});

export const outboxAttachmentParamsSchema = outboxMessageParamsSchema.extend({
  attachmentId: z.uuid({ error: 'That is not a valid file id.' }),
});
