// An outbox message as the lead's Outbox screen shows it. A sign-in link is shown as a
// placeholder: the lead sees what the person received, but cannot use their link.
import type { OutboxMessage as OutboxMessageJson } from '@heatpath/contracts';
import type { OutboxMessage } from '../db/models/index';
import { linkPlaceholder } from '../lib/mail/mail-context';

export const hiddenLink = '[personal sign-in link: shown only in the e-mail itself]';

export function presentOutboxMessage(message: OutboxMessage): OutboxMessageJson {
  const waiting = message.status === 'queued';
  return {
    id: message.id,
    kind: message.kind,
    to: message.recipients,
    subject: message.subject,
    body: message.bodyText.replaceAll(linkPlaceholder, hiddenLink),
    attachments: (message.attachments ?? []).map((a) => ({
      id: a.id,
      filename: a.filename,
      mediaType: a.mediaType,
      byteSize: a.byteSize,
      url: `/api/outbox/${message.id}/attachments/${a.id}`,
    })),
    status: message.status,
    attempts: message.attempts,
    lastError: message.lastError,
    lastAttemptAt: message.lastAttemptAt ? message.lastAttemptAt.toISOString() : null,
    nextAttemptAt: waiting ? message.nextAttemptAt.toISOString() : null,
    sentAt: message.sentAt ? message.sentAt.toISOString() : null,
    createdAt: message.createdAt.toISOString(),
    createdBy: message.creator ? { id: message.creator.id, name: message.creator.name } : null,
    caseId: message.caseId,
  };
}
