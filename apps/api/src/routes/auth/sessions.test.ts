// Sessions end on the server: signing out, a new password and a deactivation end them for good,
// in every API process, and an expired one is refused. Against real PostgreSQL.
import { Op } from 'sequelize';
import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { SignJWT } from 'jose';
import { OutboxMessage, Session } from '../../db/models/index';
import { agentFor, clientHeaders, signedIn, testApp, testConfig } from '../../test/context';
import { testClock } from '../../test/clock';
import { createWorkshop, testPassword } from '../../test/factories';
import { testMailContext, tokenIn } from '../../test/mail';

const app = testApp();
const newPassword = 'a-brand-new-password';

/** The session cookie a browser holds, to replay it after the browser has "forgotten" it. */
async function sessionCookieOf(email: string, onApp = app): Promise<string> {
  const res = await agentFor(onApp)
    .post('/api/auth/sign-in')
    .send({ email, password: testPassword });
  expect(res.status, res.text).toBe(200);
  const cookies = res.headers['set-cookie'] as unknown as string[];
  const session = cookies.find((c) => c.startsWith('heatpath_session='));
  if (!session) throw new Error('no session cookie');
  return session.split(';')[0] ?? '';
}

const meWith = (cookie: string, onApp = app) =>
  supertest(onApp).get('/api/me').set(clientHeaders).set('Cookie', cookie);

describe('signing out', () => {
  it('ends the session: the old cookie gets 401 even when sent again', async () => {
    const { people } = await createWorkshop();
    const cookie = await sessionCookieOf(people.advisor.email);
    expect((await meWith(cookie)).status).toBe(200);
    const out = await supertest(app)
      .post('/api/auth/sign-out')
      .set(clientHeaders)
      .set('Cookie', cookie);
    expect(out.status).toBe(204);
    expect(String(out.headers['set-cookie'])).toMatch(/heatpath_session=;/);
    const me = await meWith(cookie);
    expect(me.status).toBe(401);
    expect(me.body.error).toEqual({
      code: 'unauthenticated',
      message: 'Your session has ended. Please sign in again.',
    });
  });

  it('ends only that session: the same person on another browser stays signed in', async () => {
    const { people } = await createWorkshop();
    const workshopPc = await signedIn(app, people.technician.email, testPassword);
    const phone = await sessionCookieOf(people.technician.email);
    expect((await workshopPc.post('/api/auth/sign-out')).status).toBe(204);
    expect((await workshopPc.get('/api/me')).status).toBe(401);
    expect((await meWith(phone)).status).toBe(200);
  });

  it('answers 204 without a session too', async () => {
    expect((await agentFor(app).post('/api/auth/sign-out')).status).toBe(204);
  });
});

describe('a new password', () => {
  it('ends every session of the person, and the link signs in only the browser it opened in', async () => {
    const w = await createWorkshop();
    const email = w.people.lead.email;
    const stolen = await sessionCookieOf(email);
    const own = await sessionCookieOf(email);
    const colleague = await sessionCookieOf(w.people.technician.email);

    expect((await agentFor(app).post('/api/auth/password-reset').send({ email })).status).toBe(202);
    const message = await OutboxMessage.findOne({
      where: { recipients: { [Op.contains]: [{ address: email }] }, kind: 'password-reset' },
    });
    if (!message?.sealedLink) throw new Error('no reset message');
    const token = tokenIn(testMailContext().unsealLink(message.sealedLink));

    // Asking for a link changes nothing yet: the old password and sessions still work.
    expect((await meWith(stolen)).status).toBe(200);
    const browser = agentFor(app);
    const set = await browser.post('/api/auth/set-password').send({ token, password: newPassword });
    expect(set.status, set.text).toBe(200);

    expect((await meWith(stolen)).status).toBe(401);
    expect((await meWith(own)).status).toBe(401);
    expect((await browser.get('/api/me')).status).toBe(200);
    // Someone else's session is untouched.
    expect((await meWith(colleague)).status).toBe(200);
    expect(
      await Session.count({ where: { userId: w.people.lead.id, endedReason: 'password-changed' } }),
    ).toBe(2);
  });
});

describe('deactivation', () => {
  it('ends the sessions, and reactivating the person does not bring them back', async () => {
    const w = await createWorkshop();
    const lead = await signedIn(app, w.people.lead.email, testPassword);
    const old = await sessionCookieOf(w.people.technician.email);
    expect((await meWith(old)).status).toBe(200);

    const off = await lead.patch(`/api/staff/${w.people.technician.id}`).send({ active: false });
    expect(off.status, off.text).toBe(200);
    expect((await meWith(old)).status).toBe(401);
    const on = await lead.patch(`/api/staff/${w.people.technician.id}`).send({ active: true });
    expect(on.status, on.text).toBe(200);
    expect((await meWith(old)).status).toBe(401);

    // Signing in again works as usual.
    const fresh = await sessionCookieOf(w.people.technician.email);
    expect((await meWith(fresh)).status).toBe(200);
  });

  it('takes effect even when the change is made without the staff screen', async () => {
    const { people } = await createWorkshop();
    const agent = await signedIn(app, people.apprentice.email, testPassword);
    await people.apprentice.update({ active: false });
    await people.apprentice.update({ active: true });
    expect((await agent.get('/api/me')).status).toBe(401);
  });
});

describe('several API processes', () => {
  it('a second app on the same database accepts a session and refuses it once ended', async () => {
    const first = testApp();
    const second = testApp();
    const { people } = await createWorkshop();
    const cookie = await sessionCookieOf(people.lead.email, first);
    expect((await meWith(cookie, second)).status).toBe(200);

    await supertest(first).post('/api/auth/sign-out').set(clientHeaders).set('Cookie', cookie);
    expect((await meWith(cookie, first)).status).toBe(401);
    expect((await meWith(cookie, second)).status).toBe(401);
  });

  it('a deactivation through one app ends the session in the other', async () => {
    const first = testApp();
    const second = testApp();
    const w = await createWorkshop();
    const cookie = await sessionCookieOf(w.people.advisor.email, second);
    const lead = await signedIn(first, w.people.lead.email, testPassword);
    await lead.patch(`/api/staff/${w.people.advisor.id}`).send({ active: false });
    await lead.patch(`/api/staff/${w.people.advisor.id}`).send({ active: true });
    expect((await meWith(cookie, second)).status).toBe(401);
  });
});

describe('session cookies', () => {
  it('rejects a forged cookie', async () => {
    const res = await supertest(app)
      .get('/api/me')
      .set('Cookie', 'heatpath_session=eyJhbGciOiJIUzI1NiJ9.e30.abc');
    expect(res.status).toBe(401);
  });

  it('rejects a correctly signed token that names no session', async () => {
    const { people } = await createWorkshop();
    const key = new TextEncoder().encode(testConfig().sessionSecret);
    const token = await new SignJWT({ wid: people.lead.workshopId })
      .setProtectedHeader({ alg: 'HS256' })
      .setSubject(people.lead.id)
      .setIssuer('heatpath')
      .setAudience('heatpath-web')
      .setIssuedAt()
      .setExpirationTime('1h')
      .sign(key);
    expect((await meWith(`heatpath_session=${token}`)).status).toBe(401);
  });

  it('expires after SESSION_TTL_HOURS', async () => {
    const clock = testClock();
    const shortLived = testApp({ sessionTtlHours: 1 }, undefined, clock);
    const { people } = await createWorkshop();
    const agent = await signedIn(shortLived, people.lead.email, testPassword);
    clock.advance(59 * 60_000);
    expect((await agent.get('/api/me')).status).toBe(200);
    clock.advance(2 * 60_000);
    expect((await agent.get('/api/me')).status).toBe(401);
  });
});
