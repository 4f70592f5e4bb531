// Sends one e-mail over SMTP with nodemailer. Addresses go in as nodemailer address objects and
// every header value is checked again here, so a line break can never start a new header.
import nodemailer from 'nodemailer';
import type { MailRecipient } from '@heatpath/contracts';
import type { MailConfig } from '../../config';

export interface OutgoingMail {
  messageId: string;
  from: MailRecipient;
  to: MailRecipient[];
  subject: string;
  text: string;
  attachments: { filename: string; contentType: string; content: Buffer }[];
}

export interface MailSender {
  send(mail: OutgoingMail): Promise<{ messageId: string; response: string }>;
  close(): void;
}

const controlCharacters = /\p{Cc}/u;

export function assertHeaderSafe(mail: OutgoingMail): void {
  const values = [
    mail.messageId,
    mail.subject,
    mail.from.name ?? '',
    mail.from.address,
    ...mail.to.flatMap((r) => [r.name ?? '', r.address]),
    ...mail.attachments.flatMap((a) => [a.filename, a.contentType]),
  ];
  if (values.some((value) => controlCharacters.test(value)))
    throw new Error('A header value contains a line break or control character.');
}

const addressOf = (r: MailRecipient) => ({ name: r.name ?? '', address: r.address });

export function createSmtpSender(
  config: Pick<MailConfig, 'host' | 'port' | 'secure' | 'user' | 'password'>,
): MailSender {
  const transport = nodemailer.createTransport({
    host: config.host,
    port: config.port,
    secure: config.secure,
    auth: config.user ? { user: config.user, pass: config.password ?? '' } : undefined,
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 30_000,
  });
  return {
    async send(mail) {
      assertHeaderSafe(mail);
      const info = await transport.sendMail({
        messageId: mail.messageId,
        from: addressOf(mail.from),
        to: mail.to.map(addressOf),
        subject: mail.subject,
        text: mail.text,
        attachments: mail.attachments.map((a) => ({
          filename: a.filename,
          contentType: a.contentType,
          content: a.content,
        })),
        // Content only from the buffers above: never a path or URL that nodemailer would fetch.
        disableFileAccess: true,
        disableUrlAccess: true,
      });
      return { messageId: String(info.messageId), response: String(info.response ?? '') };
    },
    close() {
      transport.close();
    },
  };
}
