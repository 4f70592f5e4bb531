// Every case route × every role, unauthenticated, and from another workshop. Add a row for every
// new case route.
import { randomUUID } from 'node:crypto';
import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { roles } from '@heatpath/contracts';
import type { Role } from '@heatpath/contracts';
import { clientHeaders, signedIn, testApp } from '../../test/context';
import { createVehicle, createWorkshopWithTrees, testPassword } from '../../test/factories';
import { overheatingTreeKey } from '../../test/walks';

const app = testApp();

interface Fixture {
  caseId: string;
  vehicleId: string;
  treeId: string;
}

interface RouteCase {
  method: 'get' | 'post' | 'put';
  path: (f: Fixture) => string;
  body?: (f: Fixture) => object;
  allowed: readonly Role[];
  ok: number;
}

const readers: Role[] = ['lead', 'technician', 'advisor'];
const walkers: Role[] = ['lead', 'technician'];
const findingsEdit = {
  revision: 1,
  concern: 'c',
  cause: 'c',
  correction: 'c',
  parts: [],
  labour: [],
  followUps: [],
};

const routes: RouteCase[] = [
  { method: 'get', path: () => '/api/trees', allowed: readers, ok: 200 },
  { method: 'get', path: () => '/api/cases', allowed: readers, ok: 200 },
  {
    method: 'post',
    path: () => '/api/cases',
    body: (f) => ({ vehicleId: f.vehicleId, complaint: 'Overheats', treeId: f.treeId }),
    allowed: readers,
    ok: 201,
  },
  { method: 'get', path: (f) => `/api/cases/${f.caseId}`, allowed: readers, ok: 200 },
  { method: 'get', path: (f) => `/api/cases/${f.caseId}/events`, allowed: readers, ok: 200 },
  {
    method: 'post',
    path: (f) => `/api/cases/${f.caseId}/walk`,
    body: () => ({
      idempotencyKey: randomUUID(),
      event: {
        type: 'answer.choice',
        nodeId: 'interview-pattern',
        position: 0,
        choiceId: 'no-pattern',
      },
    }),
    allowed: walkers,
    ok: 201,
  },
  {
    method: 'post',
    path: (f) => `/api/cases/${f.caseId}/notes`,
    body: () => ({ idempotencyKey: randomUUID(), text: 'A note' }),
    allowed: walkers,
    ok: 201,
  },
  // No findings exist before an outcome: allowed roles get the 409 that explains it.
  {
    method: 'put',
    path: (f) => `/api/cases/${f.caseId}/findings`,
    body: () => findingsEdit,
    allowed: walkers,
    ok: 409,
  },
  { method: 'post', path: (f) => `/api/cases/${f.caseId}/diagnosed`, allowed: walkers, ok: 409 },
  {
    method: 'get',
    path: (f) => `/api/cases/${f.caseId}/attachments/${randomUUID()}/file`,
    allowed: readers,
    ok: 404,
  },
  // Temperature logs; temperature-logs.test.ts has the full table with real logs and uploads.
  { method: 'get', path: (f) => `/api/cases/${f.caseId}/logs`, allowed: readers, ok: 200 },
  {
    method: 'get',
    path: (f) => `/api/cases/${f.caseId}/logs/${randomUUID()}`,
    allowed: readers,
    ok: 404,
  },
  // Without a file the roles that may upload get the 400 that asks for one.
  { method: 'post', path: (f) => `/api/cases/${f.caseId}/logs`, allowed: walkers, ok: 400 },
  {
    method: 'post',
    path: (f) => `/api/cases/${f.caseId}/logs/${randomUUID()}/mapping`,
    body: () => ({ mapping: { time: 0, coolant: 1 } }),
    allowed: walkers,
    ok: 404,
  },
  {
    method: 'put',
    path: (f) => `/api/cases/${f.caseId}/logs/${randomUUID()}/mapping`,
    body: () => ({ mapping: { time: 0, coolant: 1 } }),
    allowed: walkers,
    ok: 404,
  },
];

async function fixture() {
  const w = await createWorkshopWithTrees();
  const vehicle = await createVehicle(w.workshop.id);
  const lead = await signedIn(app, w.people.lead.email, testPassword);
  const kase = await lead
    .post('/api/cases')
    .send({ vehicleId: vehicle.id, complaint: 'Overheats', treeId: w.trees[overheatingTreeKey] });
  return {
    w,
    f: {
      caseId: kase.body.id as string,
      vehicleId: vehicle.id,
      treeId: w.trees[overheatingTreeKey]!,
    },
  };
}

const label = (r: RouteCase) =>
  `${r.method.toUpperCase()} ${r.path({ caseId: ':caseId', vehicleId: ':vehicleId', treeId: ':treeId' })}`;

describe('case routes × roles', () => {
  for (const route of routes) {
    for (const role of roles) {
      const allowed = route.allowed.includes(role);
      it(`${label(route)} as ${role} → ${allowed ? route.ok : 403}`, async () => {
        const { w, f } = await fixture();
        const agent = await signedIn(app, w.people[role].email, testPassword);
        const res = await agent[route.method](route.path(f)).send(route.body?.(f));
        expect(res.status, res.text).toBe(allowed ? route.ok : 403);
      });
    }
    it(`${label(route)} unauthenticated → 401`, async () => {
      const { f } = await fixture();
      const anonymous = supertest(app);
      const res = await anonymous[route.method](route.path(f))
        .set(clientHeaders)
        .send(route.body?.(f));
      expect(res.status).toBe(401);
    });
  }

  it('another workshop’s case, vehicle or tree answers 404 on every route that names one', async () => {
    const mine = await fixture();
    const theirs = await fixture();
    const lead = await signedIn(app, mine.w.people.lead.email, testPassword);
    for (const route of routes.filter(
      (r) => r.path(theirs.f).includes(theirs.f.caseId) || r.method === 'post',
    )) {
      if (route.path(theirs.f) === '/api/cases' && route.method === 'get') continue;
      const res = await lead[route.method](route.path(theirs.f)).send(route.body?.(theirs.f));
      expect(res.status, `${label(route)}: ${res.text}`).toBe(404);
    }
  });
});
