// Bad input anywhere gets a JSON error a person understands, never a stack trace or SQL; the log
// never holds a statement or its bound values either, and "unhandled error" is only for bugs.
import { randomUUID } from 'node:crypto';
import { gzipSync } from 'node:zlib';
import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { createApp } from '../app';
import { createLogger } from '../lib/logger';
import {
  agentFor,
  clientHeaders,
  signedIn,
  testApp,
  testConfig,
  testSequelize,
} from '../test/context';
import {
  createVehicle,
  createWorkshop,
  createWorkshopWithTrees,
  testPassword,
} from '../test/factories';
import { overheatingTreeKey } from '../test/walks';

const app = testApp({ bodyLimit: '2kb' });

/** The session cookie a signed-in agent holds, to replay it against another app. */
function cookieOf(agent: Awaited<ReturnType<typeof signedIn>>): string {
  const jar = (
    agent as unknown as { jar: { getCookies: (o: object) => { toValueString(): string }[] } }
  ).jar;
  return jar
    .getCookies({ domain: '127.0.0.1', path: '/', secure: false, script: false })
    .map((c) => c.toValueString())
    .join('; ');
}

/** An app whose log lines are kept for the test to read. */
function loggedApp() {
  const lines: string[] = [];
  const logger = createLogger('info', { write: (line: string) => void lines.push(line) });
  const logged = createApp({ config: testConfig(), sequelize: testSequelize(), logger });
  return { app: logged, lines };
}

function expectCleanError(body: unknown) {
  const text = JSON.stringify(body);
  expect(text).not.toMatch(/at .*\.ts:\d+|node_modules|SELECT|INSERT|sequelize|stack/i);
}

describe('bad input', () => {
  it('malformed JSON → 400', async () => {
    const res = await supertest(app)
      .post('/api/auth/sign-in')
      .set(clientHeaders)
      .set('Content-Type', 'application/json')
      .send('{"email": ');
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      error: { code: 'bad_request', message: 'The request body is not valid JSON.' },
    });
  });

  it('oversized body → 413', async () => {
    const res = await supertest(app)
      .post('/api/auth/sign-in')
      .set(clientHeaders)
      .send({ email: 'a@b.test', password: 'x'.repeat(5000) });
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('payload_too_large');
  });

  it('wrong types → 400 naming the field', async () => {
    const res = await supertest(app)
      .post('/api/auth/sign-in')
      .set(clientHeaders)
      .send({ email: 42, password: ['x'] });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'password']);
    expectCleanError(res.body);
  });

  it('unknown API route → 404 JSON, signed in or not', async () => {
    const anon = await supertest(app).get('/api/no-such-thing');
    expect(anon.status).toBe(401);
    const { people } = await createWorkshop();
    const agent = await signedIn(app, people.lead.email, testPassword);
    const res = await agent.get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });
});

describe('a body whose Content-Encoding lies', () => {
  it('is refused with 400 on public and signed-in routes, and logged as no error', async () => {
    const { app: logged, lines } = loggedApp();
    const { people } = await createWorkshop();
    const lead = await signedIn(logged, people.lead.email, testPassword);
    for (const encoding of ['gzip', 'deflate', 'br']) {
      const raw = JSON.stringify({ email: 'a@b.test', password: 'not compressed at all' });
      const open = await supertest(logged)
        .post('/api/auth/sign-in')
        .set(clientHeaders)
        .set('Content-Type', 'application/json')
        .set('Content-Encoding', encoding)
        .send(raw);
      expect(open.status, `${encoding}: ${open.text}`).toBe(400);
      expect(open.body.error).toEqual({
        code: 'bad_request',
        message:
          'The request body could not be decompressed: its Content-Encoding does not match its content.',
      });
      const signedInCall = await lead
        .post('/api/customers')
        .set('Content-Type', 'application/json')
        .set('Content-Encoding', encoding)
        .send(JSON.stringify({ name: 'Plain Text' }));
      expect(signedInCall.status, encoding).toBe(400);
    }
    // A body that really is gzip still works (sent over a socket: supertest would re-encode it).
    const server = logged.listen(0, '127.0.0.1');
    await new Promise((resolve) => server.once('listening', resolve));
    const { port } = server.address() as { port: number };
    const real = await fetch(`http://127.0.0.1:${port}/api/customers`, {
      method: 'POST',
      headers: {
        ...clientHeaders,
        'Content-Type': 'application/json',
        'Content-Encoding': 'gzip',
        Cookie: cookieOf(lead),
      },
      body: gzipSync(JSON.stringify({ name: 'Zipped Customer' })),
    });
    server.close();
    expect(real.status, await real.text()).toBe(201);
    expect(lines.filter((l) => l.includes('unhandled error'))).toEqual([]);
  });
});

describe('text PostgreSQL cannot store', () => {
  async function openCase(agentApp: ReturnType<typeof testApp>) {
    const w = await createWorkshopWithTrees();
    const vehicle = await createVehicle(w.workshop.id);
    const tech = await signedIn(agentApp, w.people.technician.email, testPassword);
    const lead = await signedIn(agentApp, w.people.lead.email, testPassword);
    const created = await tech.post('/api/cases').send({
      vehicleId: vehicle.id,
      complaint: 'Gauge climbs.',
      treeId: w.trees[overheatingTreeKey],
    });
    expect(created.status, created.text).toBe(201);
    return { w, tech, lead, caseId: created.body.id as string };
  }

  it('refuses NUL characters and lone surrogates with 400 naming the field, and logs no SQL', async () => {
    const { app: logged, lines } = loggedApp();
    const { w, tech, lead, caseId } = await openCase(logged);
    const secret = 'Bay-4 private words';
    for (const bad of [`${secret}\u0000`, `${secret} \ud83d`, `\udc00${secret}`]) {
      const note = await tech
        .post(`/api/cases/${caseId}/notes`)
        .send({ idempotencyKey: randomUUID(), nodeId: null, text: bad });
      expect(note.status, note.text).toBe(400);
      expect(note.body.error.code).toBe('bad_request');
      expect(note.body.error.fields).toEqual({
        text: 'Contains a character that cannot be stored.',
      });
      expectCleanError(note.body);

      const treeId = w.trees[overheatingTreeKey]!;
      const draft = await lead.post(`/api/trees/${treeId}/draft`).send({});
      expect([201, 409]).toContain(draft.status);
      const current = await lead.get(`/api/trees/${treeId}/draft`);
      const definition = { ...current.body.definition, title: bad };
      const save = await lead
        .put(`/api/trees/${treeId}/draft`)
        .send({ revision: current.body.revision, definition });
      expect(save.status, save.text).toBe(400);
      expect(Object.keys(save.body.error.fields)).toEqual(['definition.title']);
    }
    const search = await tech.get('/api/vehicles?q=AB%0012');
    expect(search.status, search.text).toBe(400);
    // The sign-in limiter reads the address before validation: still a 400, not a 500.
    const signIn = await agentFor(logged)
      .post('/api/auth/sign-in')
      .send({ email: 'nul\u0000@factory.test', password: 'x' });
    expect(signIn.status, signIn.text).toBe(400);
    // A good note still goes in.
    const ok = await tech
      .post(`/api/cases/${caseId}/notes`)
      .send({ idempotencyKey: randomUUID(), nodeId: null, text: 'Cap seal 😀 fine' });
    expect(ok.status, ok.text).toBe(201);
    const log = lines.join('\n');
    expect(log).not.toMatch(/INSERT|SELECT|UPDATE "|\$1/);
    expect(log).not.toContain(secret);
    expect(log).not.toContain('unhandled error');
  });

  it('keeps a failed query’s SQL and bound values out of the log even when one slips through', async () => {
    const { serializeError } = await import('../lib/logger');
    const { DatabaseError } = await import('sequelize');
    const pgError = Object.assign(new Error('invalid input syntax for type uuid: "Bay-4 secret"'), {
      code: '22P02',
      detail: 'Key (text)=(Bay-4 secret) is bad',
      sql: 'INSERT INTO case_events (payload) VALUES ($1)',
      parameters: ['Bay-4 secret'],
    });
    const error = new DatabaseError(pgError as never);
    const text = JSON.stringify(serializeError(error));
    expect(text).not.toContain('Bay-4 secret');
    expect(text).not.toContain('INSERT');
    expect(text).toContain('22P02');
  });
});
