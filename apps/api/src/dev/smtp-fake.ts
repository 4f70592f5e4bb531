// A local SMTP server that accepts every message and keeps it, for development and tests: it
// never relays anything anywhere. `npm start` runs it on 127.0.0.1 and points Heatpath at it;
// each message lands in a folder as an .eml file (any mail program opens one), and the lead's
// Outbox screen shows what was sent. API tests start it in-process on a free loopback port.
//
//   node --import tsx src/dev/smtp-fake.ts      (SMTP_FAKE_PORT, SMTP_FAKE_DIR)
import { mkdirSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { SMTPServer } from 'smtp-server';

export interface ReceivedMail {
  from: string | null;
  to: string[];
  raw: Buffer;
  receivedAt: Date;
}

export interface SmtpFake {
  host: string;
  port: number;
  messages: ReceivedMail[];
  /** Resolves with the next message to arrive (or one already waiting past `after`). */
  waitForMessage(options?: { after?: number; timeoutMs?: number }): Promise<ReceivedMail>;
  close(): Promise<void>;
}

export async function startSmtpFake(
  options: {
    host?: string;
    port?: number;
    dir?: string;
    /** Recipients to refuse with a permanent 550, as a real server refuses an unknown mailbox. */
    refuse?: (address: string) => boolean;
  } = {},
): Promise<SmtpFake> {
  const host = options.host ?? '127.0.0.1';
  const messages: ReceivedMail[] = [];
  const waiting: (() => void)[] = [];
  if (options.dir) mkdirSync(options.dir, { recursive: true });

  const server = new SMTPServer({
    name: 'heatpath-smtp-fake',
    banner: 'Heatpath local mail fake: keeps messages, delivers none',
    // Loopback only and nothing to protect: no TLS, and sign-in is accepted but not required.
    disabledCommands: ['STARTTLS'],
    authOptional: true,
    onAuth(_auth, _session, callback) {
      callback(null, { user: 'heatpath' });
    },
    size: 25 * 1024 * 1024,
    onRcptTo(address, _session, callback) {
      if (options.refuse?.(address.address)) {
        callback(Object.assign(new Error('No such mailbox here'), { responseCode: 550 }));
        return;
      }
      callback();
    },
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('end', () => {
        const mail: ReceivedMail = {
          from: session.envelope.mailFrom ? session.envelope.mailFrom.address : null,
          to: session.envelope.rcptTo.map((r) => r.address),
          raw: Buffer.concat(chunks),
          receivedAt: new Date(),
        };
        messages.push(mail);
        if (options.dir) {
          const name = `${mail.receivedAt.toISOString().replace(/[:.]/g, '-')}-${messages.length}.eml`;
          writeFileSync(join(options.dir, name), mail.raw);
        }
        for (const wake of waiting.splice(0)) wake();
        callback();
      });
    },
  });

  await new Promise<void>((resolvePromise, reject) => {
    server.once('error', reject);
    server.listen(options.port ?? 0, host, () => {
      server.off('error', reject);
      resolvePromise();
    });
  });
  const address = server.server.address();
  const port = typeof address === 'object' && address ? address.port : (options.port ?? 0);
  server.on('error', () => undefined);

  return {
    host,
    port,
    messages,
    async waitForMessage({ after = 0, timeoutMs = 10_000 } = {}) {
      const deadline = Date.now() + timeoutMs;
      while (messages.length <= after) {
        if (Date.now() > deadline) throw new Error('No message reached the SMTP fake in time.');
        await new Promise<void>((wake) => {
          waiting.push(wake);
          setTimeout(wake, 100).unref();
        });
      }
      const next = messages[after];
      if (!next) throw new Error('No message reached the SMTP fake.');
      return next;
    },
    close: () => new Promise<void>((done) => server.close(() => done())),
  };
}

// Run directly: serve until stopped, printing one line per message.
if (process.argv[1] && resolve(process.argv[1]) === resolve(import.meta.filename)) {
  const port = Number(process.env.SMTP_FAKE_PORT ?? 2525);
  const dir = resolve(process.env.SMTP_FAKE_DIR ?? '.data/mail');
  const fake = await startSmtpFake({ port, dir });
  console.log(`SMTP fake listening on ${fake.host}:${fake.port}; messages are kept in ${dir}`);
  let seen = 0;
  setInterval(() => {
    for (const mail of fake.messages.slice(seen))
      console.log(`SMTP fake received a message for ${mail.to.join(', ')}`);
    seen = fake.messages.length;
  }, 500);
  const stop = () => void fake.close().then(() => process.exit(0));
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}
