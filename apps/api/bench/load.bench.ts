// Load benchmark (not a timed test): BENCH_TECHNICIANS (100) technicians at once for
// BENCH_SECONDS (60), each answering the steps of their cases and reading the case back between
// answers, against the real app and PostgreSQL over loopback; then, in the same run, the floor —
// a bare Express route doing one INSERT into the same database — at the same concurrency for the
// same time. Prints p50/p95/p99 per kind of request and overall, errors, the ratio to the floor,
// and counts the stored answers afterwards: every answer that got a 2xx must be there.
// Run with `npm run bench:load` from the repository root (starts its own database).
import { spawn } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import autocannon from 'autocannon';
import { QueryTypes } from 'sequelize';
import { portIsFree } from '../../../scripts/lib/postgres.mjs';
import { loadConfig } from '../src/config';
import {
  Attachment,
  DiagnosticCase,
  Tree,
  TreeVersion,
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

const technicians = Number(process.env.BENCH_TECHNICIANS ?? 100);
const seconds = Number(process.env.BENCH_SECONDS ?? 60);
// Enough cases that nobody runs out in a minute on a fast machine; one who does only reads.
const casesEach = Number(process.env.BENCH_CASES_EACH ?? 40);

async function freePort(from: number): Promise<number> {
  for (let p = from; p < from + 200; p += 1) if (await portIsFree(p)) return p;
  throw new Error(`No free port from ${from}.`);
}
const appPort = await freePort(3961);
const floorPort = await freePort(appPort + 1);

const config = loadConfig({ ...process.env, NODE_ENV: 'production' });
const sequelize = createSequelize(config.databaseUrl, { poolMax: 5 });
initModels(sequelize);
await sequelize.query('DROP SCHEMA public CASCADE; CREATE SCHEMA public;');
await migrateUp(sequelize);

// One workshop with the shipped trees; each technician has their own open cases on version 1.
const workshop = await Workshop.create({ name: 'Load Workshop' });
await installShippedTrees({ workshopId: workshop.id, userId: null });
const tree = await Tree.findOne({ where: { workshopId: workshop.id, key: overheatingTreeKey } });
const version = await TreeVersion.findOne({ where: { treeId: tree!.id } });
const passwordHash = await hashPassword('load-password-1');
const techs: { email: string; caseIds: string[] }[] = [];
let number = 0;
for (let t = 0; t < technicians; t += 1) {
  const user = await User.create({
    workshopId: workshop.id,
    email: `load-${t}@bench.test`,
    name: `Load ${t}`,
    role: 'technician',
    passwordHash,
  });
  const vehicle = await createVehicle(workshop.id);
  const cases = await DiagnosticCase.bulkCreate(
    Array.from({ length: casesEach }, () => ({
      workshopId: workshop.id,
      number: (number += 1),
      vehicleId: vehicle.id,
      customerId: vehicle.customerId,
      complaint: 'Gauge climbs in traffic.',
      symptom: 'load',
      treeVersionId: version!.id,
      assignedTo: user.id,
      createdBy: user.id,
      currentNodeId: stuckShroudPath[0]!.nodeId,
    })),
  );
  await Attachment.bulkCreate(
    evidenceRows({
      definition: version!.definition,
      steps: stuckShroudPath,
      caseIds: cases.map((c) => c.id),
      workshopId: workshop.id,
      uploadedBy: user.id,
    }),
  );
  techs.push({ email: user.email, caseIds: cases.map((c) => c.id) });
}

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
    body: JSON.stringify({ email: t.email, password: 'load-password-1' }),
  });
  if (res.status !== 200) throw new Error(`Signing in ${t.email} answered ${res.status}.`);
  cookies.push(
    res.headers
      .getSetCookie()
      .map((c) => c.split(';')[0])
      .join('; '),
  );
}

type Kind = 'answer' | 'read';
const times: Record<Kind, number[]> = { answer: [], read: [] };
const unexpected: { kind: Kind; status: number; body: string }[] = [];
/** Idempotency keys of the answers that got a 2xx: each must be stored afterwards. */
const answered: string[] = [];

function percentile(values: number[], p: number): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)] ?? NaN;
}

function run(opts: autocannon.Options, onTime: (ms: number) => void): Promise<autocannon.Result> {
  return new Promise((resolve, reject) => {
    const instance = autocannon(opts, (error, result) => (error ? reject(error) : resolve(result)));
    instance.on('response', (_c: unknown, _s: number, _b: number, ms: number) => onTime(ms));
  });
}

// One autocannon client per technician, one connection each, so each works like a person:
// answer a step, read the case back, answer the next, through their cases one after another.
function technician(i: number): Promise<autocannon.Result> {
  const t = techs[i]!;
  const state = { caseIndex: 0, step: 0, next: 'answer' as Kind, sent: 'answer' as Kind, key: '' };
  // A fresh object per request: autocannon writes the body's Content-Length into the headers it
  // is given, and a GET sent with a POST's length waits for a body that never comes.
  const headers = () => ({
    'content-type': 'application/json',
    'x-heatpath-client': 'web',
    cookie: cookies[i]!,
  });
  return run(
    {
      url: base,
      connections: 1,
      duration: seconds,
      timeout: 30,
      requests: [
        {
          setupRequest: (req) => {
            const caseId = t.caseIds[Math.min(state.caseIndex, t.caseIds.length - 1)]!;
            state.sent = state.caseIndex >= t.caseIds.length ? 'read' : state.next;
            if (state.sent === 'read')
              return { ...req, method: 'GET', path: `/api/cases/${caseId}`, headers: headers() };
            const step = stuckShroudPath[state.step]!;
            state.key = randomUUID();
            return {
              ...req,
              method: 'POST',
              path: `/api/cases/${caseId}/walk`,
              headers: headers(),
              body: JSON.stringify({
                idempotencyKey: state.key,
                event: { ...step.answer, nodeId: step.nodeId, position: state.step },
              }),
            };
          },
          onResponse: (status, body) => {
            if (status >= 300) {
              unexpected.push({ kind: state.sent, status, body: body.slice(0, 200) });
              return; // the same request is built again: a retry
            }
            if (state.sent === 'answer') {
              answered.push(state.key);
              state.step += 1;
              state.next = 'read';
            } else {
              state.next = 'answer';
              if (state.step === stuckShroudPath.length) {
                state.step = 0;
                state.caseIndex += 1;
              }
            }
          },
        },
      ],
    },
    (ms) => times[state.sent].push(ms),
  );
}

console.log(`Load: ${technicians} technicians answering and reading their cases for ${seconds} s…`);
const started = Date.now();
const results = await Promise.all(techs.map((_t, i) => technician(i)));
const appSeconds = (Date.now() - started) / 1000;

console.log(`Floor: a bare Express INSERT at ${technicians} connections for ${seconds} s…`);
const floorTimes: number[] = [];
const floor = await run(
  {
    url: `http://127.0.0.1:${floorPort}/floor`,
    method: 'POST',
    connections: technicians,
    duration: seconds,
    timeout: 30,
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ type: 'answer.choice', nodeId: 'interview-pattern', position: 0 }),
  },
  (ms) => floorTimes.push(ms),
);
server.kill('SIGTERM');

// Nothing lost: every answer that got a 2xx is a stored walk event.
let stored = 0;
for (let i = 0; i < answered.length; i += 5000) {
  const [row] = await sequelize.query<{ n: string }>(
    'SELECT count(*) AS n FROM case_events WHERE idempotency_key IN (:keys)',
    { replacements: { keys: answered.slice(i, i + 5000) }, type: QueryTypes.SELECT },
  );
  stored += Number(row?.n ?? 0);
}
await sequelize.close();

const all = [...times.answer, ...times.read];
const errors = results.reduce((n, r) => n + r.errors + r.timeouts, 0);
const line = (name: string, values: number[], rate: number) =>
  `${name.padEnd(22)} ${String(values.length).padStart(7)} req  p50 ${percentile(values, 50).toFixed(1).padStart(7)} ms  p95 ${percentile(values, 95).toFixed(1).padStart(7)} ms  p99 ${percentile(values, 99).toFixed(1).padStart(7)} ms  ${rate.toFixed(0).padStart(5)} req/s`;
console.log(`\nLoad benchmark: ${technicians} concurrent technicians, ${seconds} s, loopback`);
console.log(line('answer a step', times.answer, times.answer.length / appSeconds));
console.log(line('read the case', times.read, times.read.length / appSeconds));
console.log(line('all Heatpath requests', all, all.length / appSeconds));
console.log(line('floor (1 INSERT)', floorTimes, floor.requests.average));
const ratio = (p: number) => (percentile(all, p) / percentile(floorTimes, p)).toFixed(2);
console.log(`ratio Heatpath / floor: p50 ${ratio(50)}×, p95 ${ratio(95)}×, p99 ${ratio(99)}×`);
console.log(
  `errors: ${errors} (connection errors and timeouts), ${unexpected.length} answers that were not 2xx, floor ${floor.errors + floor.timeouts + floor.non2xx}`,
);
for (const u of unexpected.slice(0, 3)) console.log(`  ${u.kind} → ${u.status}: ${u.body}`);
console.log(
  `answers: ${answered.length} got 2xx, ${stored} stored, ${answered.length - stored} lost`,
);
process.exit(errors || unexpected.length || stored !== answered.length ? 1 : 0);
