// The lead sends a message Heatpath gave up on once more (after fixing the address or the mail
// settings, say): it goes back in the queue, due now.
import { OutboxAttachment, OutboxMessage, User } from '../../db/models/index';
import { AppError, notFound } from '../../errors';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';

export async function retryOutboxMessage(options: {
  actor: Actor;
  messageId: string;
}): Promise<OutboxMessage> {
  const { actor, messageId } = options;
  assertCan(actor, 'outbox.manage');
  const message = await OutboxMessage.findOne({
    where: { id: messageId, workshopId: actor.workshopId },
  });
  if (!message) throw notFound('That message');
  if (message.status !== 'failed')
    throw new AppError(
      'conflict',
      message.status === 'sent'
        ? 'That message was delivered already.'
        : 'That message is still waiting to go out; Heatpath keeps trying by itself.',
    );
  const [count] = await OutboxMessage.update(
    { status: 'queued', nextAttemptAt: new Date() },
    { where: { id: message.id, status: 'failed' } },
  );
  if (count === 0) throw new AppError('conflict', 'That message changed meanwhile; reload.');
  await message.reload({
    include: [
      { model: User, as: 'creator' },
      { model: OutboxAttachment, as: 'attachments', attributes: { exclude: ['content'] } },
    ],
  });
  return message;
}
