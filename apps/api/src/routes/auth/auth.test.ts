// Sign-in, sign-out, the session cookie and the sign-in rate limits, against real PostgreSQL.
import { randomUUID } from 'node:crypto';
import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { agentFor, clientHeaders, testApp } from '../../test/context';
import { createUser, createWorkshop, testPassword } from '../../test/factories';
import { signInFailedMessage } from '../../services/auth/sign-in-user';

describe('POST /api/auth/sign-in', () => {
  const app = testApp();

  it('signs in, sets an httpOnly SameSite=Lax cookie and returns the person', async () => {
    const { workshop, people } = await createWorkshop();
    const agent = agentFor(app);
    const res = await agent
      .post('/api/auth/sign-in')
      .send({ email: people.technician.email, password: testPassword });
    expect(res.status).toBe(200);
    expect(res.body.me).toMatchObject({
      email: people.technician.email,
      role: 'technician',
      workshop: { id: workshop.id },
    });
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/heatpath_session=/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    const me = await agent.get('/api/me');
    expect(me.status).toBe(200);
    expect(me.body).toMatchObject({
      email: people.technician.email,
      name: people.technician.name,
      role: 'technician',
      workshop: { id: workshop.id, name: workshop.name },
    });
  });

  it('accepts the address in any letter case', async () => {
    const { people } = await createWorkshop();
    const res = await agentFor(app)
      .post('/api/auth/sign-in')
      .send({ email: people.lead.email.toUpperCase(), password: testPassword });
    expect(res.status).toBe(200);
  });

  it('gives one generic message for a wrong password, an unknown address and a deactivated account', async () => {
    const { workshop, people } = await createWorkshop();
    const inactive = await createUser(workshop.id, 'technician', { active: false });
    const attempts = [
      { email: people.lead.email, password: 'wrong-password' },
      { email: `nobody-${randomUUID()}@factory.test`, password: testPassword },
      { email: inactive.email, password: testPassword },
    ];
    for (const body of attempts) {
      const res = await agentFor(app).post('/api/auth/sign-in').send(body);
      expect(res.status).toBe(401);
      expect(res.body).toEqual({
        error: { code: 'unauthenticated', message: signInFailedMessage },
      });
      expect(res.headers['set-cookie']).toBeUndefined();
    }
  });

  it('explains missing or malformed fields', async () => {
    const res = await agentFor(app).post('/api/auth/sign-in').send({ email: 'not-an-address' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.fields).toHaveProperty('email');
    expect(res.body.error.fields).toHaveProperty('password');
  });

  it('refuses a request without the Heatpath client header (cross-site guard)', async () => {
    const { people } = await createWorkshop();
    const res = await supertest(app)
      .post('/api/auth/sign-in')
      .send({ email: people.lead.email, password: testPassword });
    expect(res.status).toBe(403);
    expect(res.body.error.message).toMatch(/Heatpath app/);
  });
});

describe('sign-in rate limits', () => {
  it('stops repeated failures for one account, even when the right password follows', async () => {
    const app = testApp({
      signInLimits: { perAccount: 3, perAddress: 100_000, windowMinutes: 15 },
    });
    const { people } = await createWorkshop();
    for (let i = 0; i < 3; i += 1) {
      const res = await agentFor(app)
        .post('/api/auth/sign-in')
        .send({ email: people.lead.email, password: 'nope-nope' });
      expect(res.status).toBe(401);
    }
    const blocked = await agentFor(app)
      .post('/api/auth/sign-in')
      .send({ email: people.lead.email, password: testPassword });
    expect(blocked.status).toBe(429);
    expect(blocked.body.error).toEqual({
      code: 'rate_limited',
      message: expect.stringMatching(/Too many sign-in attempts/),
    });
    // Another account from the same address is unaffected.
    const other = await agentFor(app)
      .post('/api/auth/sign-in')
      .send({ email: people.technician.email, password: testPassword });
    expect(other.status).toBe(200);
  });

  it('stops too many attempts from one address', async () => {
    const app = testApp({
      trustProxy: true,
      signInLimits: { perAccount: 1000, perAddress: 4, windowMinutes: 15 },
    });
    const { people } = await createWorkshop();
    const address = `203.0.113.${Math.floor(Math.random() * 250) + 1}`;
    const send = () =>
      supertest(app)
        .post('/api/auth/sign-in')
        .set(clientHeaders)
        .set('X-Forwarded-For', address)
        .send({ email: people.advisor.email, password: testPassword });
    for (let i = 0; i < 4; i += 1) expect((await send()).status).toBe(200);
    expect((await send()).status).toBe(429);
  });
});

describe('POST /api/auth/sign-out', () => {
  it('clears the session', async () => {
    const app = testApp();
    const { people } = await createWorkshop();
    const agent = agentFor(app);
    await agent
      .post('/api/auth/sign-in')
      .send({ email: people.advisor.email, password: testPassword });
    expect((await agent.get('/api/me')).status).toBe(200);
    const out = await agent.post('/api/auth/sign-out');
    expect(out.status).toBe(204);
    const me = await agent.get('/api/me');
    expect(me.status).toBe(401);
    expect(me.body.error.code).toBe('unauthenticated');
  });
});

describe('sessions', () => {
  const app = testApp();

  it('rejects a forged cookie', async () => {
    const res = await supertest(app)
      .get('/api/me')
      .set('Cookie', 'heatpath_session=eyJhbGciOiJIUzI1NiJ9.e30.abc');
    expect(res.status).toBe(401);
  });

  it('ends the session of a person the lead deactivates', async () => {
    const { people } = await createWorkshop();
    const agent = agentFor(app);
    await agent
      .post('/api/auth/sign-in')
      .send({ email: people.technician.email, password: testPassword });
    await people.technician.update({ active: false });
    expect((await agent.get('/api/me')).status).toBe(401);
  });

  it('expires', async () => {
    const shortLived = testApp({ sessionTtlHours: 1 / 3600 });
    const { people } = await createWorkshop();
    const agent = agentFor(shortLived);
    await agent
      .post('/api/auth/sign-in')
      .send({ email: people.lead.email, password: testPassword });
    await new Promise((r) => setTimeout(r, 2100));
    expect((await agent.get('/api/me')).status).toBe(401);
  });
});
