// The workshop's outbox, newest first, one keyset page at a time (created_at, id).
import { Op } from 'sequelize';
import { OutboxAttachment, OutboxMessage, User } from '../../db/models/index';
import { AppError } from '../../errors';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';

const encodeCursor = (m: OutboxMessage) =>
  Buffer.from(`${m.createdAt.toISOString()}|${m.id}`, 'utf8').toString('base64url');

function decodeCursor(cursor: string): { createdAt: Date; id: string } {
  const [at, id] = Buffer.from(cursor, 'base64url').toString('utf8').split('|');
  const createdAt = new Date(at ?? '');
  if (!id || !/^[0-9a-f-]{36}$/.test(id) || Number.isNaN(createdAt.getTime()))
    throw new AppError('bad_request', 'That page link is not valid; open the outbox again.');
  return { createdAt, id };
}

export async function listOutbox(options: {
  actor: Actor;
  query: { cursor?: string | undefined; limit: number };
}) {
  const { actor, query } = options;
  assertCan(actor, 'outbox.read');
  const after = query.cursor ? decodeCursor(query.cursor) : null;
  const page = await OutboxMessage.findAll({
    where: {
      workshopId: actor.workshopId,
      ...(after
        ? {
            [Op.or]: [
              { createdAt: { [Op.lt]: after.createdAt } },
              { createdAt: after.createdAt, id: { [Op.lt]: after.id } },
            ],
          }
        : {}),
    },
    order: [
      ['createdAt', 'DESC'],
      ['id', 'DESC'],
    ],
    limit: query.limit + 1,
  });
  const messages = page.slice(0, query.limit);
  const ids = messages.map((m) => m.id);
  const [attachments, creators] = await Promise.all([
    ids.length
      ? OutboxAttachment.findAll({
          where: { messageId: { [Op.in]: ids } },
          attributes: ['id', 'messageId', 'filename', 'mediaType', 'byteSize', 'createdAt'],
        })
      : [],
    User.findAll({
      where: { id: { [Op.in]: messages.flatMap((m) => (m.createdBy ? [m.createdBy] : [])) } },
    }),
  ]);
  for (const m of messages) {
    m.attachments = attachments.filter((a) => a.messageId === m.id);
    m.creator = creators.find((u) => u.id === m.createdBy) ?? null;
  }
  const last = messages.at(-1);
  return { messages, nextCursor: page.length > query.limit && last ? encodeCursor(last) : null };
}
