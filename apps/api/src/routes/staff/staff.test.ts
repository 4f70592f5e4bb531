// Staff management rules: a lead manages their own workshop's people and nobody else's.
import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { agentFor, signedIn, testApp } from '../../test/context';
import { createWorkshop, testPassword } from '../../test/factories';

const app = testApp();

describe('staff management', () => {
  it('lists only the lead’s own workshop, without password hashes', async () => {
    const mine = await createWorkshop();
    await createWorkshop();
    const lead = await signedIn(app, mine.people.lead.email, testPassword);
    const res = await lead.get('/api/staff');
    expect(res.status).toBe(200);
    const emails = res.body.staff.map((s: { email: string }) => s.email).sort();
    expect(emails).toEqual(
      Object.values(mine.people)
        .map((p) => p.email)
        .sort(),
    );
    expect(JSON.stringify(res.body)).not.toMatch(/passwordHash|password_hash|\$2[aby]\$/);
  });

  it('adds a person who can then sign in with the first password', async () => {
    const { people, workshop } = await createWorkshop();
    const lead = await signedIn(app, people.lead.email, testPassword);
    const email = `new-${randomUUID().slice(0, 8)}@factory.test`;
    const res = await lead
      .post('/api/staff')
      .send({ email, name: 'Sam Ferrow', role: 'technician', password: 'a-first-password' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ email, name: 'Sam Ferrow', role: 'technician', active: true });
    const newcomer = await signedIn(app, email, 'a-first-password');
    const me = await newcomer.get('/api/me');
    expect(me.body.workshop.id).toBe(workshop.id);
  });

  it('refuses a duplicate address with 409 and a short password with 400', async () => {
    const { people } = await createWorkshop();
    const lead = await signedIn(app, people.lead.email, testPassword);
    const dup = await lead.post('/api/staff').send({
      email: people.advisor.email,
      name: 'Dup',
      role: 'advisor',
      password: 'long-enough-pass',
    });
    expect(dup.status).toBe(409);
    expect(dup.body.error.message).toMatch(/already/);
    const short = await lead
      .post('/api/staff')
      .send({ email: 'short@factory.test', name: 'Short', role: 'advisor', password: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.error.fields.password).toMatch(/at least 10/);
    const badRole = await lead
      .post('/api/staff')
      .send({ email: 'r@factory.test', name: 'R', role: 'owner', password: 'long-enough-pass' });
    expect(badRole.status).toBe(400);
    expect(badRole.body.error.fields).toHaveProperty('role');
  });

  it('changes a role, which takes effect on the next request', async () => {
    const { people } = await createWorkshop();
    const lead = await signedIn(app, people.lead.email, testPassword);
    const tech = await signedIn(app, people.technician.email, testPassword);
    expect((await tech.get('/api/staff')).status).toBe(403);
    const res = await lead.patch(`/api/staff/${people.technician.id}`).send({ role: 'lead' });
    expect(res.status).toBe(200);
    expect(res.body.role).toBe('lead');
    expect((await tech.get('/api/staff')).status).toBe(200);
  });

  it('deactivates: the person cannot sign in, and their record stays', async () => {
    const { people } = await createWorkshop();
    const lead = await signedIn(app, people.lead.email, testPassword);
    const res = await lead.patch(`/api/staff/${people.advisor.id}`).send({ active: false });
    expect(res.status).toBe(200);
    expect(res.body.active).toBe(false);
    const attempt = await agentFor(app)
      .post('/api/auth/sign-in')
      .send({ email: people.advisor.email, password: testPassword });
    expect(attempt.status).toBe(401);
    const list = await lead.get('/api/staff');
    expect(list.body.staff.find((s: { id: string }) => s.id === people.advisor.id)).toMatchObject({
      active: false,
    });
    const back = await lead.patch(`/api/staff/${people.advisor.id}`).send({ active: true });
    expect(back.body.active).toBe(true);
  });

  it('does not let a lead deactivate or demote themself', async () => {
    const { people } = await createWorkshop();
    const lead = await signedIn(app, people.lead.email, testPassword);
    const off = await lead.patch(`/api/staff/${people.lead.id}`).send({ active: false });
    expect(off.status).toBe(400);
    expect(off.body.error.message).toMatch(/your own account/);
    const demote = await lead.patch(`/api/staff/${people.lead.id}`).send({ role: 'technician' });
    expect(demote.status).toBe(400);
  });

  it('answers 404 for another workshop’s person and changes nothing', async () => {
    const mine = await createWorkshop();
    const theirs = await createWorkshop();
    const lead = await signedIn(app, mine.people.lead.email, testPassword);
    const res = await lead
      .patch(`/api/staff/${theirs.people.technician.id}`)
      .send({ active: false });
    expect(res.status).toBe(404);
    await theirs.people.technician.reload();
    expect(theirs.people.technician.active).toBe(true);
  });

  it('answers 400 for a malformed id and for an empty change', async () => {
    const { people } = await createWorkshop();
    const lead = await signedIn(app, people.lead.email, testPassword);
    expect((await lead.patch('/api/staff/not-a-uuid').send({ active: false })).status).toBe(400);
    const empty = await lead.patch(`/api/staff/${people.advisor.id}`).send({});
    expect(empty.status).toBe(400);
    expect(empty.body.error.message).toMatch(/Say what to change/);
  });
});
