// Sign-in limits with OWASP's device cookie, against real PostgreSQL: guesses from unknown
// browsers pause the account for unknown browsers only (a 429 even for the right password),
// the owner's known browser keeps its own allowance, an e-mailed link lifts the pause, and the
// per-address limit counts failures only.
import { Op } from 'sequelize';
import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { OutboxMessage } from '../../db/models/index';
import { hashPassword } from '../../lib/passwords';
import { accountPausedMessage, signInFailedMessage } from '../../services/auth/sign-in-user';
import { agentFor, clientHeaders, testApp } from '../../test/context';
import { testClock } from '../../test/clock';
import { createWorkshop, testPassword } from '../../test/factories';
import { testMailContext } from '../../test/mail';

const limits = (perAccount: number, perDevice: number, perAddress = 100_000) => ({
  signInLimits: { perAccount, perDevice, perAddress, windowMinutes: 15 },
});
let addressCounter = 0;
/** A made-up client address per test, so tests never share a per-address count. */
const freshAddress = () =>
  `198.51.${Math.floor(Math.random() * 250)}.${(addressCounter++ % 250) + 1}`;

type App = ReturnType<typeof testApp>;
const attempt = (agent: ReturnType<typeof agentFor>, email: string, password: string) =>
  agent.post('/api/auth/sign-in').send({ email, password });
/** A browser that has never signed in anywhere. */
const stranger = (app: App) => agentFor(app);

async function unlockLinkFor(email: string): Promise<{ token: string; count: number }> {
  const where = { recipients: { [Op.contains]: [{ address: email }] }, kind: 'sign-in-unlock' };
  const messages = await OutboxMessage.findAll({ where, order: [['createdAt', 'DESC']] });
  const sealed = messages[0]?.sealedLink;
  if (!sealed) throw new Error(`no unlock e-mail for ${email}`);
  const match = /\/unlock\?token=([A-Za-z0-9_-]+)/.exec(testMailContext().unsealLink(sealed));
  if (!match?.[1]) throw new Error('no unlock link');
  return { token: match[1], count: messages.length };
}

describe('guesses from unknown browsers', () => {
  it('pause the account for unknown browsers, the right password included', async () => {
    const app = testApp(limits(3, 3));
    const { people } = await createWorkshop();
    const email = people.lead.email;
    for (let i = 0; i < 3; i += 1) {
      const res = await attempt(stranger(app), email, `wrong-guess-${i}`);
      expect(res.status).toBe(401);
      expect(res.body.error.message).toBe(signInFailedMessage);
    }
    const right = await attempt(stranger(app), email, testPassword);
    expect(right.status).toBe(429);
    expect(right.body.error).toEqual({ code: 'rate_limited', message: accountPausedMessage(15) });
    expect(Number(right.headers['retry-after'])).toBeGreaterThan(14 * 60);
    expect(right.headers['set-cookie']).toBeUndefined();
    // A colleague on another unknown browser is not affected.
    expect((await attempt(stranger(app), people.technician.email, testPassword)).status).toBe(200);
  });

  it('do not lock the owner out of a browser they have signed in on before', async () => {
    const app = testApp(limits(3, 3));
    const { people } = await createWorkshop();
    const email = people.technician.email;
    const ownPc = agentFor(app);
    expect((await attempt(ownPc, email, testPassword)).status).toBe(200);
    expect((await ownPc.post('/api/auth/sign-out')).status).toBe(204);

    for (let i = 0; i < 6; i += 1) await attempt(stranger(app), email, 'attacker-guess');
    expect((await attempt(stranger(app), email, testPassword)).status).toBe(429);

    // The owner mistypes once on their own browser, then gets it right.
    expect((await attempt(ownPc, email, 'typo-typo')).status).toBe(401);
    const own = await attempt(ownPc, email, testPassword);
    expect(own.status, own.text).toBe(200);
    expect((await ownPc.get('/api/me')).status).toBe(200);
  });

  it('cannot be sped up by sending many at once', async () => {
    const app = testApp(limits(4, 4));
    const { people } = await createWorkshop();
    const answers = await Promise.all(
      Array.from({ length: 16 }, () => attempt(stranger(app), people.advisor.email, 'burst-guess')),
    );
    const statuses = answers.map((r) => r.status);
    // At most the allowance reached the password check; the rest were refused unchecked.
    expect(statuses.filter((s) => s === 401).length).toBeLessThanOrEqual(4);
    expect(statuses.filter((s) => s !== 401).every((s) => s === 429)).toBe(true);
    expect((await attempt(stranger(app), people.advisor.email, testPassword)).status).toBe(429);
  });

  it('answer an address without an account exactly as one with an account', async () => {
    const app = testApp(limits(2, 2));
    const { workshop } = await createWorkshop();
    const ghost = `ghost-${workshop.id}@factory.test`;
    for (let i = 0; i < 2; i += 1)
      expect((await attempt(stranger(app), ghost, 'anything-1')).status).toBe(401);
    const paused = await attempt(stranger(app), ghost, 'anything-2');
    expect(paused.status).toBe(429);
    expect(paused.body.error.message).toBe(accountPausedMessage(15));
    expect(await OutboxMessage.count({ where: { workshopId: workshop.id } })).toBe(0);
  });

  it('stop counting once the pause is over', async () => {
    const clock = testClock();
    const app = testApp(limits(2, 2), undefined, clock);
    const { people } = await createWorkshop();
    for (let i = 0; i < 2; i += 1) await attempt(stranger(app), people.lead.email, 'nope-nope');
    expect((await attempt(stranger(app), people.lead.email, testPassword)).status).toBe(429);
    clock.advance(14 * 60_000);
    expect((await attempt(stranger(app), people.lead.email, testPassword)).status).toBe(429);
    clock.advance(2 * 60_000);
    expect((await attempt(stranger(app), people.lead.email, testPassword)).status).toBe(200);
  });
});

describe('a known browser', () => {
  it('has its own allowance; once that is used it counts as an unknown browser', async () => {
    const app = testApp(limits(2, 3));
    const { people } = await createWorkshop();
    const email = people.lead.email;
    const pc = agentFor(app);
    expect((await attempt(pc, email, testPassword)).status).toBe(200);
    await pc.post('/api/auth/sign-out');
    for (let i = 0; i < 3; i += 1)
      expect((await attempt(pc, email, 'wrong-wrong')).status).toBe(401);
    // Its own allowance is spent: now the account's allowance for unknown browsers applies.
    for (let i = 0; i < 2; i += 1)
      expect((await attempt(pc, email, 'wrong-wrong')).status).toBe(401);
    expect((await attempt(pc, email, testPassword)).status).toBe(429);
  });

  it('is known only for the people who signed in on it', async () => {
    const app = testApp(limits(2, 5));
    const { people } = await createWorkshop();
    const sharedPc = agentFor(app);
    expect((await attempt(sharedPc, people.technician.email, testPassword)).status).toBe(200);
    for (let i = 0; i < 2; i += 1)
      await attempt(stranger(app), people.advisor.email, 'guess-guess');
    // The shared PC knows the technician, not the advisor: the advisor is paused there too.
    expect((await attempt(sharedPc, people.advisor.email, testPassword)).status).toBe(429);
    expect((await attempt(sharedPc, people.technician.email, testPassword)).status).toBe(200);
  });

  it('is forgotten when the password changes', async () => {
    const app = testApp(limits(2, 5));
    const { people } = await createWorkshop();
    const pc = agentFor(app);
    expect((await attempt(pc, people.lead.email, testPassword)).status).toBe(200);
    const changed = 'a-changed-password';
    await people.lead.update({ passwordHash: await hashPassword(changed) });
    for (let i = 0; i < 2; i += 1) await attempt(stranger(app), people.lead.email, 'guess-guess');
    // The browser is no longer known, so the pause applies to it as to any other.
    expect((await attempt(pc, people.lead.email, changed)).status).toBe(429);
  });
});

describe('the e-mailed unlock', () => {
  it('is sent once per pause and lifts it with a link that works once', async () => {
    const app = testApp(limits(2, 2));
    const w = await createWorkshop();
    const email = w.people.lead.email;
    for (let i = 0; i < 2; i += 1) await attempt(stranger(app), email, 'guess-guess');
    for (let i = 0; i < 3; i += 1)
      expect((await attempt(stranger(app), email, testPassword)).status).toBe(429);

    const { token, count } = await unlockLinkFor(email);
    expect(count).toBe(1);
    const message = await OutboxMessage.findOne({
      where: { workshopId: w.workshop.id, kind: 'sign-in-unlock' },
    });
    expect(message?.subject).toBe('Sign-in to your Heatpath account was paused');
    expect(message?.bodyText).toContain('Browsers you have signed in on before are not affected.');

    // An unlock link is not a set-password link.
    expect((await agentFor(app).post('/api/auth/set-password/check').send({ token })).status).toBe(
      404,
    );
    expect(
      (
        await agentFor(app)
          .post('/api/auth/set-password')
          .send({ token, password: 'a-new-password-x' })
      ).status,
    ).toBe(404);

    const unlock = await agentFor(app).post('/api/auth/unlock').send({ token });
    expect(unlock.status, unlock.text).toBe(200);
    expect(unlock.body.message).toMatch(/pause is lifted/);
    expect((await attempt(stranger(app), email, testPassword)).status).toBe(200);

    const again = await agentFor(app).post('/api/auth/unlock').send({ token });
    expect(again.status).toBe(404);
    expect(again.body.error.message).toMatch(/no longer works/);
  });

  it('refuses a malformed link with a sentence', async () => {
    const res = await agentFor(testApp()).post('/api/auth/unlock').send({ token: 'short' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.token).toMatch(/link is incomplete/);
  });

  it('is not needed after a new password: setting one lifts the pause', async () => {
    const app = testApp(limits(2, 2));
    const { people } = await createWorkshop();
    const email = people.advisor.email;
    for (let i = 0; i < 2; i += 1) await attempt(stranger(app), email, 'guess-guess');
    expect((await attempt(stranger(app), email, testPassword)).status).toBe(429);
    await agentFor(app).post('/api/auth/password-reset').send({ email });
    const reset = await OutboxMessage.findOne({
      where: { recipients: { [Op.contains]: [{ address: email }] }, kind: 'password-reset' },
    });
    const link = testMailContext().unsealLink(reset?.sealedLink ?? '');
    const token = /token=([A-Za-z0-9_-]+)/.exec(link)?.[1] ?? '';
    const set = await agentFor(app)
      .post('/api/auth/set-password')
      .send({ token, password: 'a-new-password-y' });
    expect(set.status, set.text).toBe(200);
    expect((await attempt(stranger(app), email, 'a-new-password-y')).status).toBe(200);
  });
});

describe('per address', () => {
  const fromAddress = (app: App, address: string, email: string, password: string) =>
    supertest(app)
      .post('/api/auth/sign-in')
      .set(clientHeaders)
      .set('X-Forwarded-For', address)
      .send({ email, password });

  it('lets a whole workshop behind one address sign in more than 40 times', async () => {
    const app = testApp({ trustProxy: true, ...limits(8, 8, 40) });
    const { people } = await createWorkshop();
    const address = freshAddress();
    const everyone = Object.values(people);
    for (let i = 0; i < 42; i += 1) {
      const person = everyone[i % everyone.length];
      if (!person) throw new Error('no person');
      const res = await fromAddress(app, address, person.email, testPassword);
      expect(res.status, `sign-in ${i + 1}: ${res.text}`).toBe(200);
    }
  });

  it('counts failures from unknown browsers, and a known browser still signs in', async () => {
    const app = testApp({ trustProxy: true, ...limits(100, 100, 4) });
    const { people } = await createWorkshop();
    const address = freshAddress();
    const known = agentFor(app).set('X-Forwarded-For', address);
    expect((await attempt(known, people.lead.email, testPassword)).status).toBe(200);
    for (let i = 0; i < 4; i += 1) {
      const email = [people.technician, people.advisor][i % 2]?.email ?? '';
      expect((await fromAddress(app, address, email, 'guess-guess')).status).toBe(401);
    }
    const blocked = await fromAddress(app, address, people.apprentice.email, testPassword);
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.message).toMatch(/Too many failed sign-ins from this network/);
    expect((await attempt(known, people.lead.email, testPassword)).status).toBe(200);
    // Another address is unaffected.
    expect(
      (await fromAddress(app, freshAddress(), people.apprentice.email, testPassword)).status,
    ).toBe(200);
  });
});
