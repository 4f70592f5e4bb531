// The advisor sends an approved repair order by e-mail, with its PDF attached, to the customer,
// themself or another address. The message and the case's audit entry are written in one
// transaction; the outbox worker delivers it, retrying while the mail server is away.
import type { RepairOrderExport, SendRepairOrderRequest } from '@heatpath/contracts';
import { OutboxMessage, User } from '../../db/models/index';
import { withTransaction } from '../../db/with-transaction';
import type { MailContext } from '../../lib/mail/mail-context';
import type { FileStore } from '../../lib/storage/file-store';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { appendCaseEvent } from '../cases/append-case-event';
import { findCase } from '../cases/find-case';
import { enqueueMail, headerSafe } from '../mail/enqueue-mail';
import { buildRepairOrder, repairOrderFilename } from './build-repair-order';
import { renderRepairOrderPdf } from './render-repair-order-pdf';

const firstParagraph = (text: string) => text.split(/\n\s*\n/)[0]?.trim() ?? text;

export function repairOrderMessage(options: {
  document: RepairOrderExport;
  input: SendRepairOrderRequest;
  sender: string;
}) {
  const { document: d, input, sender } = options;
  const car = [d.vehicle.make, d.vehicle.model].join(' ');
  const plate = d.vehicle.plate ? ` (${d.vehicle.plate})` : '';
  const greeting = input.to.name ? `Hello ${input.to.name},` : 'Hello,';
  const intro =
    input.audience === 'customer'
      ? `We have finished looking at your ${car}${plate}. Here is what we found and what we propose.`
      : `Here is the approved repair order for the ${car}${plate}, case ${d.case.reference}.`;
  const lines = [
    greeting,
    '',
    intro,
    '',
    `What was reported: ${d.findings.concern}`,
    `What we found: ${firstParagraph(d.findings.cause)}`,
    `What we propose: ${d.findings.correction}`,
    '',
    ...(input.note ? [input.note, ''] : []),
    `The attached PDF lists the parts and labour, the key readings${d.photos.length ? ' and photos' : ''} (case ${d.case.reference}, revision ${d.findings.revision}).`,
    ...(input.audience === 'customer'
      ? [
          'Nothing is done without your go-ahead: reply to this e-mail or call us with any question.',
        ]
      : []),
    '',
    sender,
    d.workshop.name,
  ];
  return {
    subject: headerSafe(`Repair order ${d.case.reference}: ${car}${plate} · ${d.workshop.name}`),
    text: lines.join('\n'),
  };
}

export async function sendRepairOrder(options: {
  actor: Actor;
  caseId: string;
  input: SendRepairOrderRequest;
  store: FileStore;
  mail: MailContext;
}): Promise<OutboxMessage> {
  const { actor, input } = options;
  assertCan(actor, 'findings.review');
  // Built and rendered before the transaction: reading photos must not hold the case's lock.
  const { document, photos } = await buildRepairOrder({ ...options, revision: input.revision });
  const pdf = await renderRepairOrderPdf(document, photos, options.store);
  const id = await withTransaction(async (transaction) => {
    const kase = await findCase({
      actor,
      caseId: options.caseId,
      transaction,
      lock: true,
      bare: true,
    });
    const sender = await User.findByPk(actor.userId, { transaction });
    const words = repairOrderMessage({ document, input, sender: sender?.name ?? '' });
    const message = await enqueueMail({
      workshopId: actor.workshopId,
      kind: 'repair-order',
      to: [input.to],
      subject: words.subject,
      text: words.text,
      attachments: [
        {
          filename: repairOrderFilename(document, 'pdf'),
          mediaType: 'application/pdf',
          content: pdf,
        },
      ],
      caseId: kase.id,
      findingsRevision: document.findings.revision,
      createdBy: actor.userId,
      mail: options.mail,
      transaction,
    });
    await appendCaseEvent({
      actor,
      kase,
      kind: 'mail',
      nodeId: null,
      payload: {
        messageId: message.id,
        revision: document.findings.revision,
        to: input.to.address,
        audience: input.audience,
      },
      transaction,
    });
    return message.id;
  });
  const message = await OutboxMessage.findByPk(id, { include: [{ model: User, as: 'creator' }] });
  if (!message) throw new Error('the outbox message vanished');
  return message;
}
