// Fuzzing every route that changes something with a few dozen generated requests each (more with
// FUZZ_RUNS; `npm run fuzz` sends thousands): no 5xx, no stack, SQL or file path in any answer.
// Routes are read from the app itself, so a new one is fuzzed without a line here.
import { beforeAll, describe, expect, it } from 'vitest';
import { signedIn, testApp } from '../test/context';
import { anonymousAgent } from '../test/access-fixture';
import { createVehicle, createWorkshopWithTrees, testPassword } from '../test/factories';
import { fuzzRoute, isMutating } from '../test/fuzz-routes';
import { apiRoutes, routeKey } from '../test/route-table';
import { overheatingTreeKey } from '../test/walks';

// Trusting X-Forwarded-For lets every request come from an address of its own.
const app = testApp({ trustProxy: true });
const runs = Number(process.env.FUZZ_RUNS ?? 30);
const routes = apiRoutes(app).filter(isMutating);
let lead: Awaited<ReturnType<typeof signedIn>>;
let ids: Record<string, string> = {};

beforeAll(async () => {
  const w = await createWorkshopWithTrees();
  lead = await signedIn(app, w.people.lead.email, testPassword);
  const vehicle = await createVehicle(w.workshop.id);
  const treeId = w.trees[overheatingTreeKey]!;
  const kase = await lead
    .post('/api/cases')
    .send({ vehicleId: vehicle.id, complaint: 'Fuzzed case', treeId });
  expect(kase.status, kase.text).toBe(201);
  const tree = await lead.get(`/api/trees/${treeId}`);
  ids = {
    caseId: kase.body.id,
    treeId,
    versionId: tree.body.latestPublished.id,
    userId: w.people.technician.id,
    vehicleId: vehicle.id,
    apprenticeId: w.people.apprentice.id,
  };
});

// Found by this fuzzing: a path value the router cannot percent-decode answered 500 everywhere.
describe('a path value that is not valid percent-encoding', () => {
  it('answers 400 with a sentence on every route that takes one, reads included', async () => {
    const wrong: string[] = [];
    for (const route of apiRoutes(app).filter((r) => r.path.includes('/:'))) {
      const verb = route.method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
      const res = await lead[verb](route.path.replace(/:\w+/g, '%E0%A4%A')).send({});
      if (res.status !== 400 || !res.body.error?.message)
        wrong.push(`${routeKey(route)} → ${res.status}`);
    }
    expect(wrong).toEqual([]);
  });
});

describe(`fuzzing every mutating route (${runs} requests each)`, () => {
  it('finds mutating routes to fuzz', () => {
    expect(routes.length).toBeGreaterThan(30);
  });
  for (const route of routes) {
    it(`${routeKey(route)}: no 5xx and nothing leaked`, { timeout: 120_000 }, async () => {
      // Sign-in and its links are for people who are not signed in; signing out must not end
      // the lead's session the other routes use.
      const agent = route.path.startsWith('/api/auth/') ? anonymousAgent(app) : lead;
      const tally = await fuzzRoute({ app, agent, route, ids, runs });
      if (tally.failure) {
        const { request, reason, text } = tally.failure;
        expect.fail(
          `${reason}: ${text.slice(0, 300)}\nrequest: ${JSON.stringify(request).slice(0, 400)}`,
        );
      }
      expect(tally.requests).toBeGreaterThanOrEqual(runs);
    });
  }
});
