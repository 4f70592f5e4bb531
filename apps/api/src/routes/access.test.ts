// Every route × every role: who gets in, who gets 403, and that nobody unauthenticated gets
// anything. Add a row here for every new route.
import { describe, expect, it } from 'vitest';
import supertest from 'supertest';
import { roles } from '@heatpath/contracts';
import type { Role } from '@heatpath/contracts';
import { clientHeaders, signedIn, testApp } from '../test/context';
import { createWorkshop, testPassword } from '../test/factories';
import type { TestWorkshop } from '../test/factories';

const app = testApp();

interface RouteCase {
  method: 'get' | 'post' | 'patch';
  path: (w: TestWorkshop) => string;
  body?: (w: TestWorkshop) => object;
  allowed: readonly Role[] | 'all';
  ok: number;
}

const routes: RouteCase[] = [
  { method: 'get', path: () => '/api/me', allowed: 'all', ok: 200 },
  {
    method: 'patch',
    path: () => '/api/me/preferences',
    body: () => ({ units: { volume: 'qt' } }),
    allowed: 'all',
    ok: 200,
  },
  { method: 'get', path: () => '/api/staff', allowed: ['lead'], ok: 200 },
  {
    method: 'post',
    path: () => '/api/staff',
    body: () => ({
      email: `m-${Math.random().toString(36).slice(2)}@factory.test`,
      name: 'Matrix',
      role: 'advisor',
      password: 'matrix-password',
    }),
    allowed: ['lead'],
    ok: 201,
  },
  {
    method: 'patch',
    path: (w) => `/api/staff/${w.people.advisor.id}`,
    body: () => ({ name: 'Renamed' }),
    allowed: ['lead'],
    ok: 200,
  },
  {
    method: 'post',
    path: () => '/api/staff/invitations',
    body: () => ({
      email: `i-${Math.random().toString(36).slice(2)}@factory.test`,
      name: 'Invited Matrix',
      role: 'technician',
    }),
    allowed: ['lead'],
    ok: 201,
  },
  // The advisor already has a password: the lead gets the 409 that says so.
  {
    method: 'post',
    path: (w) => `/api/staff/${w.people.advisor.id}/invitation`,
    allowed: ['lead'],
    ok: 409,
  },
  { method: 'get', path: () => '/api/outbox', allowed: ['lead'], ok: 200 },
  {
    method: 'get',
    path: () => '/api/vehicles?q=ZZ',
    allowed: ['lead', 'technician', 'advisor'],
    ok: 200,
  },
  {
    method: 'post',
    path: () => '/api/vehicles',
    body: () => ({
      plate: `M${Math.random().toString(36).slice(2, 8)}`,
      make: 'Brisa',
      model: 'Orlo',
    }),
    allowed: ['lead', 'technician', 'advisor'],
    ok: 201,
  },
  {
    method: 'get',
    path: () => '/api/customers?q=Zz',
    allowed: ['lead', 'technician', 'advisor'],
    ok: 200,
  },
  {
    method: 'post',
    path: () => '/api/customers',
    body: () => ({ name: 'Matrix Customer' }),
    allowed: ['lead', 'technician', 'advisor'],
    ok: 201,
  },
];

const label = (r: RouteCase) =>
  `${r.method.toUpperCase()} ${r.path({ people: { advisor: { id: ':id' } } } as unknown as TestWorkshop)}`;

describe('route × role access', () => {
  for (const route of routes) {
    for (const role of roles) {
      const allowed = route.allowed === 'all' || route.allowed.includes(role);
      it(`${label(route)} as ${role} → ${allowed ? route.ok : 403}`, async () => {
        const w = await createWorkshop();
        const agent = await signedIn(app, w.people[role].email, testPassword);
        const res = await agent[route.method](route.path(w)).send(route.body?.(w));
        expect(res.status).toBe(allowed ? route.ok : 403);
        if (!allowed) expect(res.body.error.code).toBe('forbidden');
      });
    }

    it(`${label(route)} unauthenticated → 401`, async () => {
      const w = await createWorkshop();
      const anonymous = supertest(app);
      const res = await anonymous[route.method](route.path(w))
        .set(clientHeaders)
        .send(route.body?.(w));
      expect(res.status).toBe(401);
      expect(res.body.error.code).toBe('unauthenticated');
    });
  }

  it('another workshop’s records answer 404 for every route that takes an id', async () => {
    const mine = await createWorkshop();
    const theirs = await createWorkshop();
    const lead = await signedIn(app, mine.people.lead.email, testPassword);
    for (const route of routes.filter((r) => r.path(theirs).match(/[0-9a-f-]{36}/))) {
      const res = await lead[route.method](route.path(theirs)).send(route.body?.(theirs));
      expect(res.status, `${route.method} ${route.path(theirs)}`).toBe(404);
    }
  });
});
