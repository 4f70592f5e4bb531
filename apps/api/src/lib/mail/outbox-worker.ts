// Sends what the outbox holds. Every API process may run one: a message is claimed with
// SELECT … FOR UPDATE SKIP LOCKED, so two workers never take the same one, and a claim lasts a
// limited time, so a message whose worker died is picked up again. A failed attempt waits with
// exponential backoff (capped); a mail server that is down only delays mail. Only a message the
// server keeps refusing outright (5xx) is given up on, after a set number of refusals.
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize';
import type { Logger } from 'pino';
import type { MailRecipient } from '@heatpath/contracts';
import type { MailConfig } from '../../config';
import { OutboxAttachment, OutboxMessage } from '../../db/models/index';
import { linkPlaceholder } from './mail-context';
import type { MailContext } from './mail-context';
import type { MailSender } from './mail-sender';

export interface OutboxWorkerOptions {
  sequelize: Sequelize;
  sender: MailSender;
  mail: MailContext;
  from: MailRecipient;
  settings: MailConfig['worker'];
  /** host:port, named in errors so a lead sees which server did not answer. */
  serverLabel: string;
  logger: Logger;
  /** How long a claim holds before another worker may retry the message. */
  claimMs?: number;
  /** Limit the worker to one workshop's messages (tests run a worker per test workshop). */
  onlyWorkshopId?: string;
}

export interface OutboxWorker {
  start(): void;
  /** Stops polling and waits for the attempt in flight. */
  stop(): Promise<void>;
  /** Sends everything due now; resolves with how many were sent and how many failed. */
  runOnce(): Promise<{ sent: number; failed: number }>;
}

interface SmtpishError {
  code?: string;
  responseCode?: number;
  response?: string;
  message?: string;
}

/** A refusal the server means (5xx); anything else (down, timeouts, 4xx) is worth retrying. */
export function isRefusal(error: unknown): boolean {
  const code = (error as SmtpishError | null)?.responseCode;
  return typeof code === 'number' && code >= 500 && code < 600;
}

/** One line a lead can act on, without anything from inside the message. */
export function describeSendError(error: unknown, where: string): string {
  const e = (error ?? {}) as SmtpishError;
  const clean = (text: string) => text.replace(/[\r\n\t]+/g, ' ').slice(0, 300);
  if (e.responseCode) return clean(`The mail server refused it: ${e.response ?? e.responseCode}`);
  // nodemailer wraps socket errors (ESOCKET, ECONNECTION); the cause is named in the message.
  const cause =
    /\b(ECONNREFUSED|ETIMEDOUT|ETIMEOUT|ENOTFOUND|EDNS|EAUTH)\b/.exec(
      `${e.code ?? ''} ${e.message ?? ''}`,
    )?.[1] ?? e.code;
  switch (cause) {
    case 'ECONNREFUSED':
      return `No mail server answered at ${where} (connection refused).`;
    case 'ETIMEDOUT':
    case 'ETIMEOUT':
    case 'ECONNECTION':
      return `The mail server at ${where} did not answer in time.`;
    case 'ENOTFOUND':
    case 'EDNS':
      return `The mail server name ${where} could not be found.`;
    case 'EAUTH':
      return clean(`The mail server did not accept Heatpath's sign-in: ${e.message ?? ''}`);
    default:
      return clean(`Sending failed: ${e.code ? `${e.code} ` : ''}${e.message ?? String(error)}`);
  }
}

export function backoffMs(attempts: number, settings: MailConfig['worker']): number {
  const exponential = settings.retryBaseMs * 2 ** Math.max(0, attempts - 1);
  const capped = Math.min(settings.retryMaxMs, exponential);
  // ±20 % so messages that failed together do not all come back in the same instant.
  return Math.round(capped * (0.8 + Math.random() * 0.4));
}

export function createOutboxWorker(options: OutboxWorkerOptions): OutboxWorker {
  const { sequelize, sender, mail, from, settings, logger } = options;
  const claimMs = options.claimMs ?? 2 * 60_000;
  const batch = 10;
  let timer: NodeJS.Timeout | null = null;
  let running: Promise<unknown> | null = null;
  let stopped = false;

  async function claim(): Promise<string[]> {
    const rows = await sequelize.query<{ id: string }>(
      `UPDATE outbox_messages
          SET status = 'sending', attempts = attempts + 1, last_attempt_at = now(),
              next_attempt_at = now() + $1 * interval '1 millisecond', updated_at = now()
        WHERE id IN (
          SELECT id FROM outbox_messages
           WHERE status IN ('queued', 'sending') AND next_attempt_at <= now()
             AND ($3::uuid IS NULL OR workshop_id = $3::uuid)
           ORDER BY next_attempt_at
           LIMIT $2
           FOR UPDATE SKIP LOCKED)
      RETURNING id`,
      { bind: [claimMs, batch, options.onlyWorkshopId ?? null], type: QueryTypes.SELECT },
    );
    return rows.map((r) => r.id);
  }

  async function deliver(id: string): Promise<boolean> {
    const message = await OutboxMessage.findByPk(id, {
      include: [{ model: OutboxAttachment, as: 'attachments' }],
    });
    if (!message || message.status !== 'sending') return false;
    try {
      let text = message.bodyText;
      if (message.sealedLink)
        text = text.replaceAll(linkPlaceholder, mail.unsealLink(message.sealedLink));
      const info = await sender.send({
        messageId: `<outbox-${message.id}@${from.address.split('@')[1] ?? 'heatpath.localhost'}>`,
        from,
        to: message.recipients,
        subject: message.subject,
        text,
        attachments: (message.attachments ?? []).map((a) => ({
          filename: a.filename,
          contentType: a.mediaType,
          content: a.content,
        })),
      });
      await OutboxMessage.update(
        {
          status: 'sent',
          sentAt: new Date(),
          smtpMessageId: info.messageId.slice(0, 250),
          lastError: null,
          sealedLink: null,
        },
        { where: { id, status: 'sending' } },
      );
      logger.info({ messageId: id, kind: message.kind }, 'mail sent');
      return true;
    } catch (error) {
      const refused = isRefusal(error);
      const giveUp =
        (refused && message.attempts >= settings.maxRejections) ||
        (error instanceof Error && error.message === 'not a sealed link');
      const lastError = describeSendError(error, options.serverLabel);
      await OutboxMessage.update(
        giveUp
          ? { status: 'failed', lastError, sealedLink: null }
          : {
              status: 'queued',
              lastError,
              nextAttemptAt: new Date(Date.now() + backoffMs(message.attempts, settings)),
            },
        { where: { id, status: 'sending' } },
      );
      logger.warn(
        { messageId: id, attempts: message.attempts, giveUp, lastError },
        'mail not sent',
      );
      return false;
    }
  }

  async function runOnce() {
    let sent = 0;
    let failed = 0;
    // Bounded: a queue that refills faster than it drains still yields between polls.
    for (let round = 0; round < 20 && !stopped; round += 1) {
      const ids = await claim();
      if (ids.length === 0) break;
      for (const id of ids) {
        if (await deliver(id)) sent += 1;
        else failed += 1;
      }
    }
    return { sent, failed };
  }

  function schedule() {
    if (stopped) return;
    timer = setTimeout(() => {
      running = runOnce()
        .catch((error: unknown) => logger.error({ err: error }, 'outbox worker round failed'))
        .finally(() => {
          running = null;
          schedule();
        });
    }, settings.pollMs);
    timer.unref();
  }

  return {
    start() {
      stopped = false;
      schedule();
    },
    async stop() {
      stopped = true;
      if (timer) clearTimeout(timer);
      await running;
      sender.close();
    },
    runOnce,
  };
}
