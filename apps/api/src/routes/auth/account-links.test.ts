// Invitations and password resets: the lead invites by e-mail (delivered over a real SMTP
// conversation), the link sets a password once and expires; "forgot password" answers the same
// for known and unknown addresses, its link works once, and it is rate-limited.
import { Op } from 'sequelize';
import { describe, expect, it } from 'vitest';
import { AccountToken, OutboxMessage, User } from '../../db/models/index';
import { startSmtpFake } from '../../dev/smtp-fake';
import { hiddenLink } from '../../presenters/outbox.presenter';
import { agentFor, signedIn, testApp, testConfig, testSequelize } from '../../test/context';
import { createWorkshop, testPassword } from '../../test/factories';
import { parseMail, testMailContext, testWorker, tokenIn } from '../../test/mail';
import { passwordResetAnswer } from './auth.router';

const app = testApp();
const newPassword = 'a-brand-new-password';

/** The token in the newest outbox message for an address, read through the outbox's seal. */
async function tokenSentTo(address: string): Promise<string> {
  const message = await OutboxMessage.findOne({
    where: { recipients: { [Op.contains]: [{ address: address.toLowerCase() }] } },
    order: [['createdAt', 'DESC']],
  });
  if (!message?.sealedLink) throw new Error(`no sealed link for ${address}`);
  return tokenIn(testMailContext().unsealLink(message.sealedLink));
}

/**
 * Time moves on for an address's links without waiting: a link's expiry is compared with the
 * database's clock, so its stored times are moved back by as much as would have passed.
 */
async function letTimePassForLinksOf(address: string, ms: number): Promise<void> {
  const user = await User.findOne({ where: { email: address.toLowerCase() } });
  if (!user) throw new Error(`no person with ${address}`);
  await testSequelize().query(
    `UPDATE account_tokens
        SET expires_at = expires_at - $2 * interval '1 millisecond',
            created_at = created_at - $2 * interval '1 millisecond'
      WHERE user_id = $1`,
    { bind: [user.id, ms] },
  );
}

const invitee = () => `invitee-${Math.random().toString(36).slice(2, 10)}@factory.test`;

describe('inviting staff by e-mail', () => {
  it('delivers an invitation whose link sets a password once and signs the person in', async () => {
    const w = await createWorkshop();
    const lead = await signedIn(app, w.people.lead.email, testPassword);
    const email = invitee();
    const invited = await lead
      .post('/api/staff/invitations')
      .send({ email, name: 'Ebba Quill', role: 'technician' });
    expect(invited.status, invited.text).toBe(201);
    expect(invited.body).toMatchObject({ email, invitationPending: true, active: true });
    // Not yet able to sign in: there is no password.
    expect(
      (await agentFor(app).post('/api/auth/sign-in').send({ email, password: newPassword })).status,
    ).toBe(401);

    const fake = await startSmtpFake();
    const worker = testWorker({ port: fake.port, workshopId: w.workshop.id });
    let token: string;
    try {
      expect(await worker.runOnce()).toEqual({ sent: 1, failed: 0 });
      const received = await fake.waitForMessage();
      expect(received.to).toEqual([email]);
      const mail = await parseMail(received.raw);
      expect(mail.subject).toBe(`You are invited to ${w.workshop.name} on Heatpath`);
      expect(mail.text).toContain(`${testConfig().mail.publicUrl}/set-password?token=`);
      token = tokenIn(mail.text ?? '');
    } finally {
      await worker.stop();
      await fake.close();
    }

    // The lead's outbox shows the message, but never the link; the database keeps only a hash.
    const outbox = await lead.get('/api/outbox');
    const shown = outbox.body.messages.find((m: { kind: string }) => m.kind === 'invitation');
    expect(shown.status).toBe('sent');
    expect(shown.body).toContain(hiddenLink);
    expect(shown.body).not.toContain(token);
    expect(await OutboxMessage.findByPk(shown.id)).toMatchObject({ sealedLink: null });
    expect(await AccountToken.count({ where: { tokenHash: token } })).toBe(0);

    const visitor = agentFor(app);
    const check = await visitor.post('/api/auth/set-password/check').send({ token });
    expect(check.status).toBe(200);
    expect(check.body).toMatchObject({
      purpose: 'invitation',
      email,
      name: 'Ebba Quill',
      workshopName: w.workshop.name,
    });
    const set = await visitor.post('/api/auth/set-password').send({ token, password: newPassword });
    expect(set.status, set.text).toBe(200);
    expect(set.body.me).toMatchObject({ email, role: 'technician' });
    expect((await visitor.get('/api/me')).status).toBe(200);

    const again = await agentFor(app)
      .post('/api/auth/set-password')
      .send({ token, password: 'another-password-1' });
    expect(again.status).toBe(404);
    expect(again.body.error.message).toMatch(/used already or has expired/);
    expect((await agentFor(app).post('/api/auth/set-password/check').send({ token })).status).toBe(
      404,
    );
    await signedIn(app, email, newPassword);
    const staff = await lead.get('/api/staff');
    expect(staff.body.staff.find((s: { email: string }) => s.email === email)).toMatchObject({
      invitationPending: false,
    });
  });

  it('lets a link expire, and a fresh invitation replaces the old link', async () => {
    const quick = testApp({
      accountTokens: { invitationTtlMinutes: 0.02, passwordResetTtlMinutes: 0.02 },
    });
    const w = await createWorkshop();
    const lead = await signedIn(quick, w.people.lead.email, testPassword);
    const email = invitee();
    const invited = await lead
      .post('/api/staff/invitations')
      .send({ email, name: 'Ned Ashby', role: 'advisor' });
    expect(invited.status).toBe(201);
    const first = await tokenSentTo(email);
    await letTimePassForLinksOf(email, 1500);
    const expired = await agentFor(quick)
      .post('/api/auth/set-password')
      .send({ token: first, password: newPassword });
    expect(expired.status).toBe(404);

    const resent = await lead.post(`/api/staff/${invited.body.id}/invitation`);
    expect(resent.status).toBe(201);
    const second = await tokenSentTo(email);
    expect(second).not.toBe(first);
    const ok = await agentFor(quick)
      .post('/api/auth/set-password')
      .send({ token: second, password: newPassword });
    expect(ok.status).toBe(200);
    // Once the password is set, there is nothing to invite to.
    expect((await lead.post(`/api/staff/${invited.body.id}/invitation`)).status).toBe(409);
  });

  it('refuses an address already in use, a name with a line break, and a short password', async () => {
    const w = await createWorkshop();
    const lead = await signedIn(app, w.people.lead.email, testPassword);
    const taken = await lead
      .post('/api/staff/invitations')
      .send({ email: w.people.advisor.email, name: 'Again', role: 'advisor' });
    expect(taken.status).toBe(409);
    const injected = await lead
      .post('/api/staff/invitations')
      .send({ email: invitee(), name: 'Ebba\r\nBcc: all@example.test', role: 'advisor' });
    expect(injected.status).toBe(400);
    const email = invitee();
    await lead.post('/api/staff/invitations').send({ email, name: 'Ivo Pell', role: 'technician' });
    const short = await agentFor(app)
      .post('/api/auth/set-password')
      .send({ token: await tokenSentTo(email), password: 'short' });
    expect(short.status).toBe(400);
  });
});

describe('forgot password', () => {
  it('answers the same for a known and an unknown address, and writes mail only for the known one', async () => {
    const w = await createWorkshop();
    const known = await agentFor(app)
      .post('/api/auth/password-reset')
      .send({ email: w.people.technician.email });
    const unknown = await agentFor(app)
      .post('/api/auth/password-reset')
      .send({ email: `nobody-${w.workshop.id}@factory.test` });
    expect(known.status).toBe(202);
    expect(unknown.status).toBe(202);
    expect(unknown.body).toEqual(known.body);
    expect(known.body).toEqual({
      message: passwordResetAnswer(testConfig().accountTokens.passwordResetTtlMinutes),
    });
    const messages = await OutboxMessage.findAll({ where: { workshopId: w.workshop.id } });
    expect(messages).toHaveLength(1);
    expect(messages[0]).toMatchObject({
      kind: 'password-reset',
      recipients: [{ address: w.people.technician.email }],
    });
  });

  it('sets a new password once; only the newest link works; the old password stops', async () => {
    const w = await createWorkshop();
    const email = w.people.advisor.email;
    await agentFor(app).post('/api/auth/password-reset').send({ email });
    const older = await tokenSentTo(email);
    await agentFor(app).post('/api/auth/password-reset').send({ email: email.toUpperCase() });
    const newer = await tokenSentTo(email);
    expect(
      (
        await agentFor(app)
          .post('/api/auth/set-password')
          .send({ token: older, password: newPassword })
      ).status,
    ).toBe(404);
    const check = await agentFor(app).post('/api/auth/set-password/check').send({ token: newer });
    expect(check.body.purpose).toBe('password-reset');
    const set = await agentFor(app)
      .post('/api/auth/set-password')
      .send({ token: newer, password: newPassword });
    expect(set.status).toBe(200);
    expect(
      (
        await agentFor(app)
          .post('/api/auth/set-password')
          .send({ token: newer, password: newPassword })
      ).status,
    ).toBe(404);
    await signedIn(app, email, newPassword);
    expect(
      (await agentFor(app).post('/api/auth/sign-in').send({ email, password: testPassword }))
        .status,
    ).toBe(401);
  });

  it('lets a reset link expire', async () => {
    const quick = testApp({
      accountTokens: { invitationTtlMinutes: 60, passwordResetTtlMinutes: 0.02 },
    });
    const w = await createWorkshop();
    await agentFor(quick).post('/api/auth/password-reset').send({ email: w.people.lead.email });
    const token = await tokenSentTo(w.people.lead.email);
    await letTimePassForLinksOf(w.people.lead.email, 1500);
    const res = await agentFor(quick)
      .post('/api/auth/set-password')
      .send({ token, password: newPassword });
    expect(res.status).toBe(404);
    await signedIn(quick, w.people.lead.email, testPassword);
  });

  it('sends nothing to a deactivated account', async () => {
    const w = await createWorkshop();
    await w.people.apprentice.update({ active: false });
    const res = await agentFor(app)
      .post('/api/auth/password-reset')
      .send({ email: w.people.apprentice.email });
    expect(res.status).toBe(202);
    expect(await OutboxMessage.count({ where: { workshopId: w.workshop.id } })).toBe(0);
  });

  it('is rate-limited per account, the same for addresses that exist and that do not', async () => {
    const limited = testApp({
      passwordResetLimits: { perAccount: 2, perAddress: 1000, windowMinutes: 15 },
    });
    const w = await createWorkshop();
    for (const email of [w.people.technician.email, `ghost-${w.workshop.id}@factory.test`]) {
      const statuses: number[] = [];
      for (let i = 0; i < 3; i += 1)
        statuses.push(
          (await agentFor(limited).post('/api/auth/password-reset').send({ email })).status,
        );
      expect(statuses, email).toEqual([202, 202, 429]);
    }
  });
});
