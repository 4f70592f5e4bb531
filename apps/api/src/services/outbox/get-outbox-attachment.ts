// One file sent with an outbox message, for the lead to open from the Outbox screen.
import { OutboxAttachment } from '../../db/models/index';
import { notFound } from '../../errors';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';

export async function getOutboxAttachment(options: {
  actor: Actor;
  messageId: string;
  attachmentId: string;
}): Promise<OutboxAttachment> {
  const { actor } = options;
  assertCan(actor, 'outbox.read');
  const attachment = await OutboxAttachment.findOne({
    where: { id: options.attachmentId, messageId: options.messageId, workshopId: actor.workshopId },
  });
  if (!attachment) throw notFound('That file');
  return attachment;
}
