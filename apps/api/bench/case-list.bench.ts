// Case-list benchmark (not a timed test): 50,000 cases in one workshop (and 50,000 in another,
// so the workshop filter matters), then the first page, a deep keyset page, a status filter, a
// technician filter and a search, through the real app. Prints milliseconds per request and the
// query plan of the deep page, which must use the keyset index.
// Run with `npm run bench:case-list` from the repository root (starts its own database).
import { performance } from 'node:perf_hooks';
import supertest from 'supertest';
import { createApp } from '../src/app';
import { loadConfig } from '../src/config';
import { Tree, TreeVersion, User, Workshop, initModels } from '../src/db/models/index';
import { migrateUp } from '../src/db/migrator';
import { createSequelize } from '../src/db/sequelize';
import { createLogger } from '../src/lib/logger';
import { hashPassword } from '../src/lib/passwords';
import { installShippedTrees } from '../src/services/trees/install-shipped-trees';

const perWorkshop = Number(process.env.BENCH_CASES ?? 50_000);
const config = loadConfig({ ...process.env, NODE_ENV: 'production' });
const sequelize = createSequelize(config.databaseUrl, { poolMax: 5 });
initModels(sequelize);
await sequelize.query('DROP SCHEMA public CASCADE; CREATE SCHEMA public;');
await migrateUp(sequelize);

const passwordHash = await hashPassword('bench-password-1');
async function seedWorkshop(name: string) {
  const workshop = await Workshop.create({ name });
  const techs = [];
  for (let i = 0; i < 8; i += 1) {
    techs.push(
      await User.create({
        workshopId: workshop.id,
        email: `t${i}-${workshop.id.slice(0, 8)}@bench.test`,
        name: `Tech ${i}`,
        role: 'technician',
        passwordHash,
      }),
    );
  }
  const lead = await User.create({
    workshopId: workshop.id,
    email: `lead-${workshop.id.slice(0, 8)}@bench.test`,
    name: 'Lead',
    role: 'lead',
    passwordHash,
  });
  await installShippedTrees({ workshopId: workshop.id, userId: lead.id });
  const tree = await Tree.findOne({ where: { workshopId: workshop.id } });
  const version = await TreeVersion.findOne({ where: { treeId: tree!.id } });
  // Vehicles and cases in bulk, in SQL: timestamps at millisecond precision like the app writes.
  await sequelize.query(
    `INSERT INTO customers (id, workshop_id, name) SELECT gen_random_uuid(), $1, 'Customer ' || g FROM generate_series(1, $2) g`,
    { bind: [workshop.id, perWorkshop / 5] },
  );
  await sequelize.query(
    `INSERT INTO vehicles (id, workshop_id, customer_id, plate, plate_key, make, model, year)
     SELECT gen_random_uuid(), $1, c.id, 'BN' || lpad(row_number() over ()::text, 6, '0'), 'BN' || lpad(row_number() over ()::text, 6, '0'), 'Corvane', 'Tessel', 2015
       FROM customers c WHERE c.workshop_id = $1`,
    { bind: [workshop.id] },
  );
  await sequelize.query(
    `WITH v AS (SELECT id, customer_id, plate, row_number() over () AS n FROM vehicles WHERE workshop_id = $1)
     INSERT INTO cases (id, workshop_id, number, vehicle_id, customer_id, complaint, symptom, tree_version_id, status, assigned_to, created_by, current_node_id, search_text, created_at, updated_at)
     SELECT gen_random_uuid(), $1, g, v.id, v.customer_id, 'Overheats sometimes', 'bench', $2,
            (ARRAY['open','in_diagnosis','diagnosed','closed']::case_status[])[1 + g % 4],
            ($3::uuid[])[1 + g % 8], $4, 'interview-pattern',
            lower('C-' || lpad(g::text, 5, '0') || ' ' || v.plate || ' customer ' || g),
            date_trunc('milliseconds', now() - (g || ' minutes')::interval), now()
       FROM generate_series(1, $5) g JOIN v ON v.n = 1 + g % ($5 / 5)`,
    { bind: [workshop.id, version!.id, techs.map((t) => t.id), lead.id, perWorkshop] },
  );
  await sequelize.query(`UPDATE workshops SET case_counter = $2 WHERE id = $1`, {
    bind: [workshop.id, perWorkshop],
  });
  return { workshop, lead, techs };
}

const t0 = performance.now();
const mine = await seedWorkshop('Bench Workshop');
await seedWorkshop('Other Bench Workshop');
await sequelize.query('ANALYZE');
console.log(`seeded ${2 * perWorkshop} cases in ${((performance.now() - t0) / 1000).toFixed(1)} s`);

const app = createApp({
  config: {
    ...config,
    signInLimits: { perAccount: 1e6, perDevice: 1e6, perAddress: 1e6, windowMinutes: 1 },
  },
  sequelize,
  logger: createLogger('silent'),
});
const agent = supertest.agent(app).set('X-Heatpath-Client', 'web');
await agent
  .post('/api/auth/sign-in')
  .send({ email: mine.lead.email, password: 'bench-password-1' })
  .expect(200);

async function time(label: string, query: Record<string, string | number>, runs = 20) {
  const times: number[] = [];
  let body: { cases: unknown[]; nextCursor: string | null } = { cases: [], nextCursor: null };
  for (let i = 0; i < runs; i += 1) {
    const start = performance.now();
    const res = await agent.get('/api/cases').query(query).expect(200);
    times.push(performance.now() - start);
    body = res.body;
  }
  times.sort((a, b) => a - b);
  console.log(
    `${label.padEnd(34)} median ${times[Math.floor(runs / 2)]!.toFixed(1).padStart(6)} ms   max ${times[runs - 1]!.toFixed(1).padStart(6)} ms   (${body.cases.length} rows)`,
  );
  return body;
}

const first = await time('first page (25)', { limit: 25 });
// Walk 1,000 pages deep by cursor, then time that page.
let cursor = first.nextCursor;
for (let i = 0; i < 1000 && cursor; i += 1)
  cursor = (await agent.get('/api/cases').query({ limit: 25, cursor }).expect(200)).body.nextCursor;
await time('page 1,001 by keyset cursor', { limit: 25, cursor: cursor ?? '' });
await time('status = diagnosed', { limit: 25, status: 'diagnosed' });
await time('one technician', { limit: 25, technicianId: mine.techs[3]!.id });
await time('search by plate "bn004"', { limit: 25, q: 'bn004' });
await time('search by reference "c-49999"', { limit: 25, q: 'c-49999' });

const [plan] = await sequelize.query(
  `EXPLAIN SELECT id FROM cases WHERE workshop_id = $1 AND (created_at, id) < (now() - interval '20000 minutes', gen_random_uuid()) ORDER BY created_at DESC, id DESC LIMIT 26`,
  { bind: [mine.workshop.id] },
);
console.log(
  'deep-page plan:',
  (plan as { 'QUERY PLAN': string }[]).map((r) => r['QUERY PLAN']).join(' | '),
);
await sequelize.close();
process.exit(0);
