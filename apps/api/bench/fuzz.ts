// `npm run fuzz`: every route that changes something, FUZZ_RUNS (1,000) generated requests each,
// against the real app on its own database (scripts/fuzz.mjs starts it). Prints, per route, the
// requests sent and the statuses they got, and the smallest failing request if one answered 5xx
// or showed a stack, SQL or a path. Exits non-zero on any failure.
import supertest from 'supertest';
import { createApp } from '../src/app';
import { loadConfig } from '../src/config';
import { initModels } from '../src/db/models/index';
import { migrateUp } from '../src/db/migrator';
import { createSequelize } from '../src/db/sequelize';
import { createLogger } from '../src/lib/logger';
import { createVehicle, createWorkshopWithTrees, testPassword } from '../src/test/factories';
import { fuzzRoute, isMutating } from '../src/test/fuzz-routes';
import { apiRoutes, routeKey } from '../src/test/route-table';
import { overheatingTreeKey } from '../src/test/walks';

const runs = Number(process.env.FUZZ_RUNS ?? 1000);
const seed = process.env.FUZZ_SEED ? Number(process.env.FUZZ_SEED) : Date.now() % 2 ** 31;

const config = loadConfig({ ...process.env, NODE_ENV: 'test', LOG_LEVEL: 'silent' });
const sequelize = createSequelize(config.databaseUrl, { poolMax: 5 });
initModels(sequelize);
await sequelize.query('DROP SCHEMA public CASCADE; CREATE SCHEMA public;');
await migrateUp(sequelize);
// Every request comes from an address of its own, so rate limits answer as for real clients.
const app = createApp({
  config: { ...config, trustProxy: true },
  sequelize,
  logger: createLogger('silent'),
});

const w = await createWorkshopWithTrees();
const lead = supertest.agent(app).set('X-Heatpath-Client', 'web');
const signIn = await lead
  .post('/api/auth/sign-in')
  .send({ email: w.people.lead.email, password: testPassword });
if (signIn.status !== 200) throw new Error(`Signing in the lead answered ${signIn.status}.`);
const vehicle = await createVehicle(w.workshop.id);
const treeId = w.trees[overheatingTreeKey]!;
const kase = await lead
  .post('/api/cases')
  .send({ vehicleId: vehicle.id, complaint: 'Fuzzed case', treeId });
const tree = await lead.get(`/api/trees/${treeId}`);
const ids: Record<string, string> = {
  caseId: kase.body.id,
  treeId,
  versionId: tree.body.latestPublished.id,
  userId: w.people.technician.id,
  vehicleId: vehicle.id,
  apprenticeId: w.people.apprentice.id,
};

const routes = apiRoutes(app).filter(isMutating);
console.log(`Fuzzing ${routes.length} routes, ${runs} requests each (seed ${seed})…\n`);
let total = 0;
let failures = 0;
let fiveHundreds = 0;
for (const route of routes) {
  const anonymous = supertest.agent(app).set('X-Heatpath-Client', 'web');
  const agent = route.path.startsWith('/api/auth/') ? anonymous : lead;
  const tally = await fuzzRoute({ app, agent, route, ids, runs, seed });
  total += tally.requests;
  fiveHundreds += Object.entries(tally.statuses)
    .filter(([s]) => Number(s) >= 500)
    .reduce((n, [, c]) => n + c, 0);
  const statuses = Object.entries(tally.statuses)
    .map(([s, n]) => `${s}×${n}`)
    .join(' ');
  console.log(`${routeKey(route).padEnd(62)} ${String(tally.requests).padStart(6)}  ${statuses}`);
  if (tally.failure) {
    failures += 1;
    const { request, reason, text } = tally.failure;
    console.log(
      `  ✗ ${reason}: ${text.slice(0, 200)}\n    ${JSON.stringify(request).slice(0, 300)}`,
    );
  }
}
console.log(
  `\n${total} requests to ${routes.length} routes: ${fiveHundreds} answered 5xx, ${failures} routes failed.`,
);
await sequelize.close();
process.exit(failures ? 1 : 0);
