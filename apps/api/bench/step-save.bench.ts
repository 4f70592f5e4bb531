// Step-save benchmark (not a timed test): 50 simulated technicians, each on their own cases,
// answer the steps of the shipped overheating tree against the real app and PostgreSQL; in the
// same run, the floor is a bare Express route doing one INSERT into the same database. Prints
// p50/p95/p99 for both and the ratio (target: step-save p95 ≤ 1.5 × floor p95).
// Run with `npm run bench:step-save` from the repository root (starts its own database).
import { spawn } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import autocannon from 'autocannon';
import { loadConfig } from '../src/config';
import {
  Attachment,
  DiagnosticCase,
  Tree,
  User,
  Workshop,
  initModels,
} from '../src/db/models/index';
import { migrateUp } from '../src/db/migrator';
import { createSequelize } from '../src/db/sequelize';
import { hashPassword } from '../src/lib/passwords';
import { installShippedTrees } from '../src/services/trees/install-shipped-trees';
import { createVehicle } from '../src/test/factories';
import { overheatingTreeKey, stuckShroudPath } from '../src/db/seeders/demo-walks';
import { evidenceRows } from './evidence-rows';

const technicians = 50;
const casesEach = Number(process.env.BENCH_CASES_EACH ?? 6);
const appPort = 3951;
const floorPort = 3952;
const requests = technicians * casesEach * stuckShroudPath.length;

const config = loadConfig({ ...process.env, NODE_ENV: 'production' });
const sequelize = createSequelize(config.databaseUrl, { poolMax: 10 });
initModels(sequelize);
await sequelize.query('DROP SCHEMA public CASCADE; CREATE SCHEMA public;');
await migrateUp(sequelize);

// Fixture: one workshop, 50 technicians, each with their own cases on version 1 of the tree.
const workshop = await Workshop.create({ name: 'Bench Workshop' });
await installShippedTrees({ workshopId: workshop.id, userId: null });
const tree = await Tree.findOne({ where: { workshopId: workshop.id, key: overheatingTreeKey } });
const { TreeVersion } = await import('../src/db/models/index');
const version = await TreeVersion.findOne({ where: { treeId: tree!.id } });
const passwordHash = await hashPassword('bench-password-1');
const techs: { email: string; caseIds: string[] }[] = [];
let number = 0;
for (let t = 0; t < technicians; t += 1) {
  const user = await User.create({
    workshopId: workshop.id,
    email: `bench-${t}@bench.test`,
    name: `Bench ${t}`,
    role: 'technician',
    passwordHash,
  });
  const caseIds: string[] = [];
  for (let c = 0; c < casesEach; c += 1) {
    const vehicle = await createVehicle(workshop.id);
    number += 1;
    const kase = await DiagnosticCase.create({
      workshopId: workshop.id,
      number,
      vehicleId: vehicle.id,
      customerId: vehicle.customerId,
      complaint: 'Bench complaint',
      symptom: 'bench',
      treeVersionId: version!.id,
      assignedTo: user.id,
      createdBy: user.id,
      currentNodeId: 'interview-pattern',
    });
    caseIds.push(kase.id);
  }
  await Attachment.bulkCreate(
    evidenceRows({
      definition: version!.definition,
      steps: stuckShroudPath,
      caseIds: caseIds,
      workshopId: workshop.id,
      uploadedBy: user.id,
    }),
  );
  techs.push({ email: user.email, caseIds });
}
await sequelize.close();

const server = spawn(process.execPath, ['--import', 'tsx', 'bench/bench-server.ts'], {
  cwd: new URL('..', import.meta.url).pathname,
  env: { ...process.env, BENCH_APP_PORT: String(appPort), BENCH_FLOOR_PORT: String(floorPort) },
  stdio: ['ignore', 'pipe', 'inherit'],
});
await new Promise<void>((resolve) =>
  server.stdout.on('data', (d: Buffer) => d.toString().includes('ready') && resolve()),
);

const base = `http://127.0.0.1:${appPort}`;
const cookies: string[] = [];
for (const t of techs) {
  const res = await fetch(`${base}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', 'x-heatpath-client': 'web' },
    body: JSON.stringify({ email: t.email, password: 'bench-password-1' }),
  });
  cookies.push((res.headers.get('set-cookie') ?? '').split(';')[0] ?? '');
}

let unexpected = 0;

interface Measured {
  result: autocannon.Result;
  /** Every response time in ms, from autocannon's per-response event. */
  times: number[];
}

function run(opts: autocannon.Options): Promise<Measured> {
  return new Promise((resolve, reject) => {
    const times: number[] = [];
    const instance = autocannon(opts, (error, result) =>
      error ? reject(error) : resolve({ result, times }),
    );
    instance.on(
      'response',
      (_client: unknown, _status: number, _bytes: number, responseTime: number) =>
        times.push(responseTime),
    );
  });
}

function percentile(times: number[], p: number): number {
  const sorted = [...times].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)] ?? NaN;
}

// Warm both paths (JIT, pools, the compiled-tree cache) before measuring.
await run({
  url: `http://127.0.0.1:${floorPort}/floor`,
  method: 'POST',
  connections: 10,
  amount: 500,
  headers: { 'content-type': 'application/json' },
  body: JSON.stringify({ warm: true }),
});

const floor = await run({
  url: `http://127.0.0.1:${floorPort}/floor`,
  method: 'POST',
  connections: technicians,
  amount: requests,
  headers: { 'content-type': 'application/json' },
  body: JSON.stringify({
    type: 'answer.choice',
    nodeId: 'interview-pattern',
    position: 0,
    choiceId: 'speed-or-load',
  }),
});

// One autocannon client per technician, one connection each: a technician answers one step,
// waits for it to be stored, then answers the next, through all their cases.
const walkStarted = Date.now();
const perTech = await Promise.all(
  techs.map((t, i) => {
    const state = { caseIndex: 0, step: 0 };
    return run({
      url: base,
      connections: 1,
      amount: casesEach * stuckShroudPath.length,
      requests: [
        {
          setupRequest: (req) => {
            const step = stuckShroudPath[state.step]!;
            return {
              ...req,
              method: 'POST',
              path: `/api/cases/${t.caseIds[state.caseIndex % t.caseIds.length]}/walk`,
              headers: {
                'content-type': 'application/json',
                'x-heatpath-client': 'web',
                cookie: cookies[i]!,
              },
              body: JSON.stringify({
                idempotencyKey: randomUUID(),
                event: { ...step.answer, nodeId: step.nodeId, position: state.step },
              }),
            };
          },
          onResponse: (status, body) => {
            if (status !== 201) {
              if (unexpected < 3)
                console.log(`step save answered ${status}: ${body.slice(0, 300)}`);
              unexpected += 1;
              return;
            }
            state.step += 1;
            if (state.step === stuckShroudPath.length) {
              state.step = 0;
              state.caseIndex += 1;
            }
          },
        },
      ],
    });
  }),
);
const walkSeconds = (Date.now() - walkStarted) / 1000;
const walk: Measured = {
  result: {
    ...perTech[0]!.result,
    non2xx: perTech.reduce((n, m) => n + m.result.non2xx, 0),
    requests: { ...perTech[0]!.result.requests, average: requests / walkSeconds },
  },
  times: perTech.flatMap((m) => m.times),
};
server.kill('SIGTERM');

const row = (name: string, m: Measured) =>
  `${name.padEnd(20)} p50 ${percentile(m.times, 50).toFixed(1).padStart(6)} ms   p95 ${percentile(m.times, 95).toFixed(1).padStart(6)} ms   p99 ${percentile(m.times, 99).toFixed(1).padStart(6)} ms   ${Math.round(m.result.requests.average)} req/s   ${m.result.non2xx} non-2xx`;
const ratio = (p: number) => (percentile(walk.times, p) / percentile(floor.times, p)).toFixed(2);
console.log(
  `\nStep-save benchmark: ${technicians} concurrent technicians, ${requests} requests per run (${casesEach} cases × ${stuckShroudPath.length} steps each)`,
);
console.log(row('floor (1 INSERT)', floor));
console.log(row('step save (walk)', walk));
console.log(
  `ratio step save / floor: p50 ${ratio(50)}×, p95 ${ratio(95)}× (target ≤ 1.5×), p99 ${ratio(99)}×`,
);
if (unexpected) console.log(`${unexpected} step saves did not return 201 — see the server log.`);
process.exit(0);
