// The database going away and coming back, and a pool with no free connection: every request
// gets 503 `unavailable` with Retry-After quickly (never 500, never a 10-second hang), an answer
// that got a 2xx is kept, and the server serves again by itself once PostgreSQL is back. The
// outage is a TCP proxy in front of the shared test cluster that this file closes and reopens,
// so no other test's database is touched; the models of this file run through it.
import { randomUUID } from 'node:crypto';
import { createServer } from 'node:net';
import type { Server, Socket } from 'node:net';
import { connect } from 'node:net';
import { afterAll, describe, expect, it } from 'vitest';
import { CaseEvent, initModels } from '../db/models/index';
import { createSequelize } from '../db/sequelize';
import { signedIn, testApp } from '../test/context';
import { createVehicle, createWorkshopWithTrees, testPassword } from '../test/factories';
import { overheatingTreeKey, stuckShroudPath } from '../test/walks';

/** A TCP proxy to PostgreSQL that can be cut (listener closed, every socket destroyed). */
function databaseProxy(target: URL) {
  const sockets = new Set<Socket>();
  let server: Server | null = null;
  let port = 0;
  const listen = () =>
    new Promise<void>((resolve) => {
      server = createServer((client) => {
        const upstream = connect(Number(target.port), target.hostname);
        for (const s of [client, upstream]) {
          sockets.add(s);
          s.on('close', () => sockets.delete(s));
          s.on('error', () => s.destroy());
        }
        client.pipe(upstream).pipe(client);
      });
      server.listen(port, '127.0.0.1', () => {
        port = (server!.address() as { port: number }).port;
        resolve();
      });
    });
  return {
    up: listen,
    down: () =>
      new Promise<void>((resolve) => {
        for (const s of sockets) s.destroy();
        if (server) server.close(() => resolve());
        else resolve();
        server = null;
      }),
    url: () => {
      const url = new URL(target);
      url.port = String(port);
      return url.toString();
    },
  };
}

const proxy = databaseProxy(new URL(process.env.DATABASE_URL!));
await proxy.up();
// A small pool with a short wait on purpose, so exhaustion is easy to cause and its 503 quick to
// see. The connect timeout is not what the outage is seen by (a stopped proxy refuses at once), and
// the set-up connects through it too: on a loaded machine a connection may take a second or two.
const sequelize = createSequelize(proxy.url(), {
  poolMax: 3,
  acquireTimeoutMs: 400,
  connectTimeoutMs: 5_000,
});
initModels(sequelize);
const app = testApp({}, sequelize);
afterAll(async () => {
  await sequelize.close();
  await proxy.down();
});

async function openCase() {
  const w = await createWorkshopWithTrees();
  const vehicle = await createVehicle(w.workshop.id);
  const tech = await signedIn(app, w.people.technician.email, testPassword);
  const created = await tech.post('/api/cases').send({
    vehicleId: vehicle.id,
    complaint: 'Gauge climbs on hills.',
    treeId: w.trees[overheatingTreeKey],
  });
  expect(created.status, created.text).toBe(201);
  return { tech, caseId: created.body.id as string };
}

function expectUnavailable(res: {
  status: number;
  text: string;
  body: unknown;
  headers: Record<string, string>;
}) {
  expect(res.status, res.text).toBe(503);
  expect((res.body as { error: { code: string } }).error.code).toBe('unavailable');
  expect(res.headers['retry-after']).toBe('5');
  expect(res.text).not.toMatch(/SELECT|INSERT|sequelize|ECONN|at .*\.ts:\d+/i);
}

describe('PostgreSQL down', () => {
  it('answers every read and write with 503, keeps each 2xx answer, and recovers by itself', async () => {
    const { tech, caseId } = await openCase();
    const first = stuckShroudPath[0]!;
    const answered = await tech.post(`/api/cases/${caseId}/walk`).send({
      idempotencyKey: randomUUID(),
      event: { ...first.answer, nodeId: first.nodeId, position: 0 },
    });
    expect(answered.status, answered.text).toBe(201);
    const second = stuckShroudPath[1]!;
    const secondAnswer = {
      idempotencyKey: randomUUID(),
      event: { ...second.answer, nodeId: second.nodeId, position: answered.body.walk.position },
    };

    await proxy.down();
    const started = Date.now();
    expectUnavailable(await tech.post(`/api/cases/${caseId}/walk`).send(secondAnswer));
    expectUnavailable(
      await tech
        .post(`/api/cases/${caseId}/notes`)
        .send({ idempotencyKey: randomUUID(), nodeId: null, text: 'Lost to the outage?' }),
    );
    expectUnavailable(await tech.get(`/api/cases/${caseId}`));
    expectUnavailable(await tech.post('/api/customers').send({ name: 'Outage Customer' }));
    // Four calls refused at once, not after a long hang (a hang would run to the test's timeout).
    expect(Date.now() - started).toBeLessThan(15_000);

    await proxy.up();
    // The client retries the unanswered answer with the same key until the server is back:
    // a condition, not a wait for time. Each try is one request; a few may still meet a
    // connection the outage broke.
    let retried = await tech.post(`/api/cases/${caseId}/walk`).send(secondAnswer);
    for (let tries = 0; retried.status === 503 && tries < 20; tries += 1)
      retried = await tech.post(`/api/cases/${caseId}/walk`).send(secondAnswer);
    expect(retried.status, retried.text).toBe(201);
    const again = await tech.post(`/api/cases/${caseId}/walk`).send(secondAnswer);
    expect(again.status).toBe(200);
    expect(again.body.repeated).toBe(true);
    // Both answers that got a 2xx are stored, once each; the refused note is not.
    const events = await CaseEvent.findAll({ where: { caseId }, order: [['seq', 'ASC']] });
    expect(events.map((e) => e.kind)).toEqual(['answer', 'answer']);
  });
});

describe('a pool with no free connection', () => {
  it('answers 503 with Retry-After within the acquire timeout, then serves again', async () => {
    const { tech, caseId } = await openCase();
    let release!: () => void;
    const gate = new Promise<void>((resolve) => (release = resolve));
    // Every connection of the pool held by a transaction that waits on the gate; each says
    // when it holds its connection, and the test goes on once all do (a condition, not a time).
    const holding: Promise<void>[] = [];
    const holders = Array.from({ length: 3 }, () => {
      let held!: () => void;
      holding.push(new Promise<void>((resolve) => (held = resolve)));
      return sequelize.transaction(async (transaction) => {
        await sequelize.query('SELECT 1', { transaction });
        held();
        await gate;
      });
    });
    await Promise.all(holding);

    const started = Date.now();
    expectUnavailable(await tech.get(`/api/cases/${caseId}`));
    expect(Date.now() - started).toBeLessThan(3000);

    release();
    await Promise.all(holders);
    const after = await tech.get(`/api/cases/${caseId}`);
    expect(after.status, after.text).toBe(200);
  });
});
