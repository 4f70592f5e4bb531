// Writes an e-mail to the outbox inside the caller's transaction, so the message exists exactly
// when what caused it does (an invitation with its person, a send with its audit entry). The
// outbox worker sends it later. Recipients and subject are checked here: a bad address or a
// line break in a header field is refused before anything is stored.
import { headerTextSchema, mailRecipientSchema } from '@heatpath/contracts';
import type { MailRecipient, OutboxKind } from '@heatpath/contracts';
import type { Transaction } from 'sequelize';
import { z } from 'zod';
import { OutboxAttachment, OutboxMessage } from '../../db/models/index';
import { describeZodError } from '../../middlewares/validate';
import { linkPlaceholder } from '../../lib/mail/mail-context';
import type { MailContext } from '../../lib/mail/mail-context';

const outgoingSchema = z.object({
  to: z.array(mailRecipientSchema).min(1, 'Name at least one recipient.').max(10),
  subject: headerTextSchema(250, 'A subject').pipe(z.string().min(1, 'Write a subject.')),
  text: z.string().min(1).max(100_000),
  attachments: z
    .array(
      z.object({
        filename: headerTextSchema(200, 'A file name').pipe(z.string().min(1)),
        mediaType: z.string().regex(/^[a-z]+\/[a-z0-9.+-]+$/),
        content: z.instanceof(Buffer),
      }),
    )
    .max(5),
});

/** Makes a value safe for a composed header (a subject built from stored names): no breaks. */
export const headerSafe = (value: string): string =>
  value
    .replace(/\p{Cc}+/gu, ' ')
    .replace(/\s{2,}/g, ' ')
    .trim();

export async function enqueueMail(options: {
  workshopId: string;
  kind: OutboxKind;
  to: MailRecipient[];
  subject: string;
  /** Plain text. Where a sign-in link belongs, write linkPlaceholder and pass `link`. */
  text: string;
  link?: string;
  attachments?: { filename: string; mediaType: string; content: Buffer }[];
  caseId?: string | null;
  findingsRevision?: number | null;
  createdBy: string | null;
  mail: MailContext;
  transaction: Transaction;
}): Promise<OutboxMessage> {
  const parsed = outgoingSchema.safeParse({
    to: options.to,
    subject: options.subject,
    text: options.text,
    attachments: options.attachments ?? [],
  });
  if (!parsed.success) throw describeZodError(parsed.error);
  if (options.link && !options.text.includes(linkPlaceholder))
    throw new Error('A message with a link must say where it goes.');
  const { transaction } = options;
  const message = await OutboxMessage.create(
    {
      workshopId: options.workshopId,
      kind: options.kind,
      caseId: options.caseId ?? null,
      findingsRevision: options.findingsRevision ?? null,
      recipients: parsed.data.to,
      subject: parsed.data.subject,
      bodyText: parsed.data.text,
      sealedLink: options.link ? options.mail.sealLink(options.link) : null,
      createdBy: options.createdBy,
    },
    { transaction },
  );
  for (const a of parsed.data.attachments) {
    await OutboxAttachment.create(
      {
        messageId: message.id,
        workshopId: options.workshopId,
        filename: a.filename,
        mediaType: a.mediaType,
        byteSize: a.content.length,
        content: a.content,
      },
      { transaction },
    );
  }
  return message;
}
