// E-mail in tests: the outbox worker pointed at an SMTP fake on a free loopback port, limited
// to one test workshop so parallel tests never send each other's mail.
import { simpleParser } from 'mailparser';
import type { ParsedMail } from 'mailparser';
import { createLogger } from '../lib/logger';
import { createMailContext } from '../lib/mail/mail-context';
import { createSmtpSender } from '../lib/mail/mail-sender';
import { createOutboxWorker } from '../lib/mail/outbox-worker';
import { testConfig, testSequelize } from './context';

export const testMailSettings = {
  enabled: true,
  pollMs: 50,
  // Retries wait minutes, as in production, so a slow machine never makes one fall due by
  // itself within a test; tests move the stored times on instead (mail.test.ts).
  retryBaseMs: 60_000,
  retryMaxMs: 600_000,
  maxRejections: 3,
};

/** The same seal the test app uses, to read a link straight from the outbox. */
export const testMailContext = () => {
  const config = testConfig();
  return createMailContext({ publicUrl: config.mail.publicUrl, secret: config.sessionSecret });
};

export function testWorker(options: { port: number; workshopId: string }) {
  const config = testConfig();
  return createOutboxWorker({
    sequelize: testSequelize(),
    sender: createSmtpSender({
      ...config.mail,
      host: '127.0.0.1',
      port: options.port,
      secure: false,
    }),
    mail: testMailContext(),
    from: config.mail.from,
    settings: testMailSettings,
    serverLabel: `127.0.0.1:${options.port}`,
    logger: createLogger('silent'),
    onlyWorkshopId: options.workshopId,
  });
}

export const parseMail = (raw: Buffer): Promise<ParsedMail> => simpleParser(raw);

/** The token of the first Heatpath set-password link in a text. */
export function tokenIn(text: string): string {
  const match = /\/set-password\?token=([A-Za-z0-9_-]+)/.exec(text);
  if (!match?.[1]) throw new Error(`no set-password link in: ${text}`);
  return match[1];
}
