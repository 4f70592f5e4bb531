// Sign-in and its cookies, against real PostgreSQL. Sessions ending: sessions.test.ts; the
// sign-in limits: sign-in-limits.test.ts; Secure cookies and HSTS: cookie-security.test.ts.
import { randomUUID } from 'node:crypto';
import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { agentFor, testApp } from '../../test/context';
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
    // The browser is remembered as one this person signed in on, for sign-in's eyes only.
    const setCookies = res.headers['set-cookie'] as unknown as string[];
    const device = setCookies.find((c) => c.startsWith('heatpath_device='));
    expect(device).toMatch(/Path=\/api\/auth;/);
    expect(device).toMatch(/HttpOnly/);
    expect(device).toMatch(/SameSite=Strict/);
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
