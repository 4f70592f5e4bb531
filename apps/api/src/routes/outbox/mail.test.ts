// E-mail through a real SMTP conversation: the repair order reaches an smtp-server on a free
// loopback port with its PDF and the right recipients; with the server down the message stays
// queued (status, attempts, last error) and goes out once it is back; no header can be injected.
import { describe, expect, it, vi } from 'vitest';
import { OutboxMessage } from '../../db/models/index';
import { startSmtpFake } from '../../dev/smtp-fake';
import { testApp, testSequelize } from '../../test/context';
import { parseMail, testMailSettings, testWorker } from '../../test/mail';
import { approveLatest, diagnosedCase } from '../../test/repair-orders';

const app = testApp();

async function approvedCase() {
  const fixture = await diagnosedCase(app);
  const review = await fixture.advisor.get(`/api/cases/${fixture.caseId}/findings/review`);
  const current = review.body.current;
  await fixture.advisor.put(`/api/cases/${fixture.caseId}/findings`).send({
    revision: current.revision,
    concern: current.concern,
    cause: current.cause,
    correction: current.correction,
    parts: current.parts,
    labour: current.labour,
    followUps: current.followUps,
    photoIds: [fixture.photoId],
  });
  const approved = await approveLatest(fixture.advisor, fixture.caseId);
  return { ...fixture, revision: approved.approvedRevision as number };
}

/**
 * Time moves on for a workshop's queued mail without waiting: a retry falls due by the database's
 * clock, so the message's stored times are moved back by as much as would have passed.
 */
async function letTimePassForMailOf(workshopId: string, ms: number): Promise<void> {
  await testSequelize().query(
    `UPDATE outbox_messages
        SET next_attempt_at = next_attempt_at - $2 * interval '1 millisecond',
            last_attempt_at = last_attempt_at - $2 * interval '1 millisecond'
      WHERE workshop_id = $1 AND status = 'queued'`,
    { bind: [workshopId, ms] },
  );
}

/** Longer than any retry waits (testMailSettings.retryMaxMs plus its jitter). */
const retryWait = 2 * testMailSettings.retryMaxMs;

const customer = { name: 'Morwenna Tregarth', address: 'morwenna.tregarth@example.test' };

describe('sending a repair order by e-mail', () => {
  it('delivers it over SMTP with the PDF attached to the chosen recipient', async () => {
    const { caseId, advisor, lead, revision, reference, w } = await approvedCase();
    const fake = await startSmtpFake();
    const worker = testWorker({ port: fake.port, workshopId: w.workshop.id });
    try {
      const sent = await advisor.post(`/api/cases/${caseId}/findings/send`).send({
        revision,
        to: customer,
        audience: 'customer',
        note: 'The car can stay with us until the part arrives on Thursday.',
      });
      expect(sent.status, sent.text).toBe(201);
      expect(sent.body).toMatchObject({ status: 'queued', attempts: 0, revision, to: [customer] });

      expect(await worker.runOnce()).toEqual({ sent: 1, failed: 0 });
      const received = await fake.waitForMessage();
      expect(received.to).toEqual([customer.address]);
      const mail = await parseMail(received.raw);
      expect(mail.subject).toContain(`Repair order ${reference}`);
      expect(mail.to && !Array.isArray(mail.to) ? mail.to.value : []).toEqual([
        { name: customer.name, address: customer.address },
      ]);
      expect(mail.text).toContain('Hello Morwenna Tregarth,');
      expect(mail.text).toContain('until the part arrives on Thursday');
      expect(mail.attachments).toHaveLength(1);
      const pdf = mail.attachments[0]!;
      expect(pdf.contentType).toBe('application/pdf');
      expect(pdf.filename).toBe(`${reference}-repair-order-r${revision}.pdf`);
      expect(pdf.content.subarray(0, 5).toString()).toBe('%PDF-');

      const outbox = await lead.get('/api/outbox');
      expect(outbox.status).toBe(200);
      expect(outbox.body.messages[0]).toMatchObject({
        kind: 'repair-order',
        status: 'sent',
        attempts: 1,
        lastError: null,
        to: [customer],
        caseId,
        attachments: [{ filename: pdf.filename, mediaType: 'application/pdf' }],
      });
      const attachment = await lead.get(outbox.body.messages[0].attachments[0].url);
      expect(attachment.status).toBe(200);
      expect(attachment.headers['content-type']).toBe('application/pdf');

      const review = await advisor.get(`/api/cases/${caseId}/findings/review`);
      expect(review.body.sends[0]).toMatchObject({ status: 'sent', revision, to: [customer] });
      const events = await advisor.get(`/api/cases/${caseId}/events`);
      expect(events.body.events.at(-1).summary).toBe(
        `Sent the repair order (revision ${revision}) to ${customer.address}`,
      );
    } finally {
      await worker.stop();
      await fake.close();
    }
  });

  it('keeps the message queued while the mail server is down and delivers it once it is back', async () => {
    const { caseId, advisor, lead, revision, w } = await approvedCase();
    const first = await startSmtpFake();
    const port = first.port;
    await first.close();
    const worker = testWorker({ port, workshopId: w.workshop.id });
    let fake: Awaited<ReturnType<typeof startSmtpFake>> | null = null;
    try {
      const sent = await advisor
        .post(`/api/cases/${caseId}/findings/send`)
        .send({ revision, to: { address: 'front-desk@example.test' }, audience: 'advisor' });
      expect(sent.status).toBe(201);

      expect(await worker.runOnce()).toEqual({ sent: 0, failed: 1 });
      const waiting = (await lead.get('/api/outbox')).body.messages[0];
      expect(waiting).toMatchObject({ status: 'queued', attempts: 1, sentAt: null });
      expect(waiting.lastError).toBe(
        `No mail server answered at 127.0.0.1:${port} (connection refused).`,
      );
      expect(new Date(waiting.nextAttemptAt).getTime()).toBeGreaterThan(
        new Date(waiting.lastAttemptAt).getTime(),
      );
      // Still down at the next try: it waits longer, and nothing is lost.
      await letTimePassForMailOf(w.workshop.id, retryWait);
      await worker.runOnce();
      expect((await lead.get('/api/outbox')).body.messages[0]).toMatchObject({
        status: 'queued',
        attempts: 2,
      });

      fake = await startSmtpFake({ port });
      await letTimePassForMailOf(w.workshop.id, retryWait);
      expect(await worker.runOnce()).toEqual({ sent: 1, failed: 0 });
      const received = await fake.waitForMessage();
      expect(received.to).toEqual(['front-desk@example.test']);
      const delivered = (await lead.get('/api/outbox')).body.messages[0];
      expect(delivered).toMatchObject({ status: 'sent', attempts: 3, lastError: null });
      const review = await advisor.get(`/api/cases/${caseId}/findings/review`);
      expect(review.body.sends[0]).toMatchObject({ status: 'sent', attempts: 3 });
    } finally {
      await worker.stop();
      await fake?.close();
    }
  });

  it('sends each message once when two workers run at the same time', async () => {
    const { caseId, advisor, revision, w } = await approvedCase();
    const fake = await startSmtpFake();
    const a = testWorker({ port: fake.port, workshopId: w.workshop.id });
    const b = testWorker({ port: fake.port, workshopId: w.workshop.id });
    try {
      for (const address of ['one@example.test', 'two@example.test', 'three@example.test']) {
        const res = await advisor
          .post(`/api/cases/${caseId}/findings/send`)
          .send({ revision, to: { address }, audience: 'other' });
        expect(res.status).toBe(201);
      }
      const [ra, rb] = await Promise.all([a.runOnce(), b.runOnce()]);
      expect(ra.sent + rb.sent).toBe(3);
      await vi.waitFor(() => expect(fake.messages).toHaveLength(3));
      expect(fake.messages.map((m) => m.to[0]).sort()).toEqual([
        'one@example.test',
        'three@example.test',
        'two@example.test',
      ]);
    } finally {
      await Promise.all([a.stop(), b.stop()]);
      await fake.close();
    }
  });

  it('refuses a recipient that would inject a header, or is not an address', async () => {
    const { caseId, advisor, revision } = await approvedCase();
    for (const to of [
      { name: 'Morwenna\r\nBcc: everyone@example.test', address: customer.address },
      { name: 'Morwenna', address: 'morwenna@example.test\r\nBcc: everyone@example.test' },
      { address: 'not an address' },
    ]) {
      const res = await advisor
        .post(`/api/cases/${caseId}/findings/send`)
        .send({ revision, to, audience: 'customer' });
      expect(res.status, JSON.stringify(to)).toBe(400);
    }
    expect(await OutboxMessage.count({ where: { caseId } })).toBe(0);
  });

  it('gives up on a recipient the server keeps refusing, and says why', async () => {
    const { caseId, advisor, lead, revision, w } = await approvedCase();
    const fake = await startSmtpFake({ refuse: (address) => address.startsWith('nobody@') });
    const worker = testWorker({ port: fake.port, workshopId: w.workshop.id });
    try {
      await advisor
        .post(`/api/cases/${caseId}/findings/send`)
        .send({ revision, to: { address: 'nobody@example.test' }, audience: 'other' });
      for (let attempt = 1; attempt <= 3; attempt += 1) {
        await worker.runOnce();
        await letTimePassForMailOf(w.workshop.id, retryWait);
      }
      const message = (await lead.get('/api/outbox')).body.messages[0];
      expect(message).toMatchObject({ status: 'failed', attempts: 3, nextAttemptAt: null });
      expect(message.lastError).toMatch(/^The mail server refused it: 550/);
      expect(fake.messages).toHaveLength(0);
    } finally {
      await worker.stop();
      await fake.close();
    }
  });

  it('lets the lead send again a message Heatpath gave up on', async () => {
    const { caseId, advisor, lead, revision } = await approvedCase();
    const sent = await advisor
      .post(`/api/cases/${caseId}/findings/send`)
      .send({ revision, to: customer, audience: 'customer' });
    expect((await lead.post(`/api/outbox/${sent.body.id}/retry`)).status).toBe(409);
    await OutboxMessage.update(
      { status: 'failed', lastError: 'The mail server refused it: 550 no such mailbox' },
      { where: { id: sent.body.id } },
    );
    const retried = await lead.post(`/api/outbox/${sent.body.id}/retry`);
    expect(retried.status).toBe(200);
    expect(retried.body).toMatchObject({
      status: 'queued',
      attachments: [{ mediaType: 'application/pdf' }],
    });
  });
});
