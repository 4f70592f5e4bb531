// Who may call what: every route the built app answers (read from Express's own router stack)
// × nobody signed in, the four roles, and the lead of another workshop, all on the first
// workshop's records. The expected answer of each call is in one table below; a route without
// a row fails, and so does a row for a route that no longer exists.
//
// Reading the table: a cell is the status that person gets, or several joined by "/" when more
// than one is right (a second lead asking for what a first call already did gets 409). The
// calls run down the table and, within a row, anonymous → other → apprentice → advisor →
// technician → lead, so forbidden calls come before the ones that change anything; rows that
// depend on an earlier row say so. "other" must also never see one of the first workshop's ids.
import { randomUUID } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import type { Response } from 'supertest';
import { logCsv, syntheticLog } from '@heatpath/temperature-log/testing';
import { signedIn, testApp } from '../test/context';
import { accessFixture, actors, anonymousAgent } from '../test/access-fixture';
import type { AccessFixture, ActorName } from '../test/access-fixture';
import { testPassword } from '../test/factories';
import { testPhoto } from '../test/repair-orders';
import { apiRoutes, routeKey } from '../test/route-table';
import { stuckShroudPath } from '../test/walks';

// Trusting X-Forwarded-For lets a row send from an address of its own (see password-reset).
const app = testApp({ trustProxy: true });

// prettier-ignore
const matrix = `
  route                                                        anonymous technician lead      apprentice advisor  other
  GET    /api/health                                           200       200        200       200        200      200
  POST   /api/auth/sign-in                                     401       401        401       401        401      401
  POST   /api/auth/password-reset                              202       202        202       202        202      202
  POST   /api/auth/set-password/check                          404       404        404       404        404      404
  POST   /api/auth/set-password                                404       404        404       404        404      404
  POST   /api/auth/unlock                                      404       404        404       404        404      404
  POST   /api/auth/sign-out                                    204       204        204       204        204      204
  GET    /api/me                                               401       200        200       200        200      200
  PATCH  /api/me/preferences                                   401       200        200       200        200      200
  GET    /api/staff                                            401       403        200       403        403      200
  POST   /api/staff                                            401       403        201       403        403      201
  POST   /api/staff/invitations                                401       403        201       403        403      201
  POST   /api/staff/:userId/invitation                         401       403        409       403        403      404
  PATCH  /api/staff/:userId                                    401       403        200       403        403      404
  GET    /api/vehicles                                         401       200        200       403        200      200
  POST   /api/vehicles                                         401       201        201       403        201      201
  GET    /api/vehicles/:vehicleId                              401       200        200       403        200      404
  GET    /api/customers                                        401       200        200       403        200      200
  POST   /api/customers                                        401       201        201       403        201      201
  GET    /api/trees/available                                  401       200        200       403        200      200
  GET    /api/trees                                            401       200        200       403        200      200
  POST   /api/trees                                            401       403        201       403        403      201
  GET    /api/trees/:treeId                                    401       200        200       403        200      404
  DELETE /api/trees/:treeId                                    401       403        204       403        403      404
  GET    /api/trees/:treeId/versions/:versionId                401       200        200       403        200      404
  GET    /api/trees/:treeId/versions/:versionId/export         401       200        200       403        200      404
  GET    /api/trees/:treeId/diff                               401       200        200       403        200      404
  POST   /api/trees/:treeId/draft                              401       403        201       403        403      404
  DELETE /api/trees/:treeId/draft                              401       403        204       403        403      404
  GET    /api/trees/:treeId/draft                              401       403        200       403        403      404
  PUT    /api/trees/:treeId/draft                              401       403        200       403        403      404
  POST   /api/trees/:treeId/draft/regression                   401       403        200       403        403      404
  POST   /api/trees/:treeId/draft/publish                      401       403        200       403        403      404
  PUT    /api/trees/:treeId/regression-set                     401       403        200       403        403      404
  POST   /api/trees/:treeId/versions/:versionId/retire         401       403        200       403        403      404
  GET    /api/cases                                            401       200        200       403        200      200
  POST   /api/cases                                            401       201        201       403        201      404
  GET    /api/cases/:caseId                                    401       200        200       403        200      404
  POST   /api/cases/:caseId/walk                               401       201        409       403        403      404
  POST   /api/cases/:caseId/notes                              401       201        201       403        403      404
  PUT    /api/cases/:caseId/findings                           401       403        409       403        200      404
  POST   /api/cases/:caseId/diagnosed                          401       409        409       403        403      404
  GET    /api/cases/:caseId/events                             401       200        200       403        200      404
  POST   /api/cases/:caseId/attachments                        401       201        201       403        403      404
  GET    /api/cases/:caseId/attachments/:attachmentId/file     401       200        200       403        200      404
  GET    /api/cases/:caseId/attachments/:attachmentId/thumbnail 401      200        200       403        200      404
  GET    /api/cases/:caseId/findings/review                    401       403        200       403        200      404
  POST   /api/cases/:caseId/findings/approve                   401       403        200       403        200      404
  GET    /api/cases/:caseId/findings/export/:format            401       403        200       403        200      404
  POST   /api/cases/:caseId/findings/send                      401       403        201       403        201      404
  GET    /api/cases/:caseId/logs                               401       200        200       403        200      404
  POST   /api/cases/:caseId/logs                               401       201        201       403        403      404
  POST   /api/cases/:caseId/logs/:pendingUploadId/mapping      401       201        404       403        403      404
  PUT    /api/cases/:caseId/logs/:logId/mapping                401       200        200       403        403      404
  GET    /api/cases/:caseId/logs/:logId                        401       200        200       403        200      404
  GET    /api/outbox                                           401       403        200       403        403      200
  GET    /api/outbox/:messageId/attachments/:attachmentId      401       403        200       403        403      404
  POST   /api/outbox/:messageId/retry                          401       403        409       403        403      404
  GET    /api/training/candidates                              401       403        200       403        403      200
  GET    /api/training/cases                                   401       403        200       403        403      200
  POST   /api/training/cases                                   401       403        409       403        403      404
  PATCH  /api/training/cases/:trainingCaseId                   401       403        200       403        403      404
  GET    /api/training/courses                                 401       403        200       403        403      200
  POST   /api/training/courses                                 401       403        201       403        403      400
  PUT    /api/training/courses/:courseId                       401       403        200       403        403      404
  POST   /api/training/courses/:courseId/sign-offs             401       403        201       403        403      404
  GET    /api/training/progress                                401       403        200       403        403      200
  GET    /api/training/progress/:apprenticeId                  401       403        200       403        403      404
  GET    /api/training/casebook                                401       403        200       200        403      200
  GET    /api/training/me/progress                             401       403        200       200        403      200
  GET    /api/training/cases/:trainingCaseId/replay            401       403        200       200        403      404
  GET    /api/training/cases/:trainingCaseId/tree              401       403        200       200        403      404
  GET    /api/training/cases/:trainingCaseId/photos/:attachmentId/:which 401 403      200       200        403      404
  POST   /api/training/cases/:trainingCaseId/attempts          401       403        201       201        403      404
  GET    /api/training/attempts/:attemptId                     401       403        200       200        403      404
  POST   /api/training/attempts/:attemptId/predictions         401       403        404       200        403      404
`;

interface Row {
  key: string;
  expected: Record<ActorName, number[]>;
}

function parseMatrix(text: string): Row[] {
  const lines = text.trim().split('\n').slice(1);
  return lines.map((line) => {
    const [method, path, ...cells] = line.trim().split(/\s+/);
    if (!method || !path || cells.length !== actors.length)
      throw new Error(
        `The matrix row "${line.trim()}" needs a status for each of ${actors.join(', ')}.`,
      );
    const expected = Object.fromEntries(
      actors.map((a, i) => [a, cells[i]!.split('/').map(Number)]),
    ) as Record<ActorName, number[]>;
    return { key: `${method} ${path}`, expected };
  });
}

/** How to call a route on the first workshop's records: path values, query, body or a file. */
interface Call {
  params?: (f: AccessFixture) => Record<string, string>;
  query?: (f: AccessFixture) => string;
  body?: (f: AccessFixture) => object;
  file?: () => Promise<{ field: string; bytes: Buffer; name: string; type: string }>;
  headers?: () => Record<string, string>;
  /** Sign in afresh for this call (signing out must not end the session the other rows use). */
  ownSession?: boolean;
}

const unique = () => randomUUID().slice(0, 8);
// An address from TEST-NET-2 (RFC 5737), never a real client.
const ownAddress = () => ({
  'X-Forwarded-For': `198.51.100.${Math.floor(Math.random() * 250) + 1}`,
});

const calls: Record<string, Call> = {
  'POST /api/auth/sign-in': {
    body: () => ({ email: 'nobody-here@factory.test', password: 'not-the-password' }),
  },
  // The mail-link routes are limited per address: each call comes from an address of its own,
  // so the limit the other API tests share on 127.0.0.1 is not used up.
  'POST /api/auth/password-reset': {
    body: () => ({ email: `nobody-${unique()}@factory.test` }),
    headers: ownAddress,
  },
  'POST /api/auth/set-password/check': {
    body: () => ({ token: 'x'.repeat(43) }),
    headers: ownAddress,
  },
  'POST /api/auth/set-password': {
    body: () => ({ token: 'x'.repeat(43), password: 'a-long-enough-password' }),
    headers: ownAddress,
  },
  'POST /api/auth/unlock': { body: () => ({ token: 'x'.repeat(43) }), headers: ownAddress },
  'POST /api/auth/sign-out': { ownSession: true },
  'PATCH /api/me/preferences': { body: () => ({ units: { volume: 'L' } }) },
  'POST /api/staff': {
    body: () => ({
      email: `m-${unique()}@factory.test`,
      name: 'Matrix Person',
      role: 'advisor',
      password: 'matrix-password',
    }),
  },
  'POST /api/staff/invitations': {
    body: () => ({
      email: `i-${unique()}@factory.test`,
      name: 'Invited Person',
      role: 'technician',
    }),
  },
  'PATCH /api/staff/:userId': { body: () => ({ name: 'Renamed Advisor' }) },
  'GET /api/vehicles': { query: () => 'q=ZZ' },
  'POST /api/vehicles': { body: () => ({ plate: `M${unique()}`, make: 'Brisa', model: 'Orlo' }) },
  'GET /api/customers': { query: () => 'q=Zz' },
  'POST /api/customers': { body: () => ({ name: 'Matrix Customer' }) },
  'POST /api/trees': {
    body: () => ({ mode: 'blank', title: 'Matrix tree', symptom: 'Gauge reads high' }),
  },
  'DELETE /api/trees/:treeId': { params: (f) => ({ treeId: f.unpublishedTreeId }) },
  'GET /api/trees/:treeId/diff': { query: (f) => `from=${f.versionId}&to=${f.versionId}` },
  'POST /api/trees/:treeId/draft': { body: () => ({}) },
  // Discards the draft the row above opened on the same tree.
  'DELETE /api/trees/:treeId/draft': {},
  'GET /api/trees/:treeId/draft': { params: (f) => ({ treeId: f.draftTreeId }) },
  'PUT /api/trees/:treeId/draft': {
    params: (f) => ({ treeId: f.draftTreeId }),
    body: (f) => ({ revision: f.draftRevision, definition: f.draftDefinition }),
  },
  'POST /api/trees/:treeId/draft/regression': { params: (f) => ({ treeId: f.draftTreeId }) },
  // After the save above the draft is at the next revision.
  'POST /api/trees/:treeId/draft/publish': {
    params: (f) => ({ treeId: f.draftTreeId }),
    body: (f) => ({
      revision: f.draftRevision + 1,
      changeNote: 'Published by the access matrix.',
      confirmChangedOutcomes: true,
    }),
  },
  'PUT /api/trees/:treeId/regression-set': { body: (f) => ({ caseIds: [f.caseId] }) },
  'POST /api/trees/:treeId/versions/:versionId/retire': {
    params: (f) => ({ treeId: f.retireTreeId, versionId: f.retireVersionId }),
  },
  'POST /api/cases': {
    body: (f) => ({ vehicleId: f.vehicleId, complaint: 'Fan never runs.', treeId: f.treeId }),
  },
  'POST /api/cases/:caseId/walk': {
    params: (f) => ({ caseId: f.openCaseId }),
    body: () => ({
      idempotencyKey: randomUUID(),
      event: { ...stuckShroudPath[0]!.answer, nodeId: stuckShroudPath[0]!.nodeId, position: 0 },
    }),
  },
  'POST /api/cases/:caseId/notes': {
    params: (f) => ({ caseId: f.openCaseId }),
    body: () => ({ idempotencyKey: randomUUID(), nodeId: null, text: 'Fan relay clicks.' }),
  },
  // After diagnosis the advisor edits (a new revision); the lead's edit of the same revision
  // then gets the 409 that says someone saved first.
  'PUT /api/cases/:caseId/findings': {
    body: (f) => ({
      revision: f.findingsRevision,
      concern: 'Overheats on climbs.',
      cause: 'Fan shroud stuck.',
      correction: 'Free the shroud.',
      parts: [],
      labour: [],
      followUps: [],
    }),
  },
  'POST /api/cases/:caseId/attachments': {
    params: (f) => ({ caseId: f.openCaseId }),
    file: async () => ({
      field: 'file',
      bytes: await testPhoto(),
      name: 'fan.png',
      type: 'image/png',
    }),
  },
  // The advisor approves the revision saved above; the lead's second approval gets 409.
  'POST /api/cases/:caseId/findings/approve': {
    body: (f) => ({ revision: f.findingsRevision + 1 }),
  },
  'GET /api/cases/:caseId/findings/export/:format': { params: () => ({ format: 'csv' }) },
  'POST /api/cases/:caseId/findings/send': {
    body: (f) => ({
      revision: f.approvedRevision,
      to: { address: 'owner@example.test' },
      audience: 'customer',
    }),
  },
  'GET /api/cases/:caseId/logs': { params: (f) => ({ caseId: f.openCaseId }) },
  'POST /api/cases/:caseId/logs': {
    params: (f) => ({ caseId: f.openCaseId }),
    file: async () => ({
      field: 'file',
      bytes: Buffer.from(
        logCsv(
          syntheticLog({
            seed: 9,
            durationSeconds: 300,
            startC: 20,
            closedAsymptoteC: 120,
            timeConstantSeconds: 200,
            openingC: 88,
            noiseK: 0.1,
          }),
        ),
      ),
      name: 'matrix.csv',
      type: 'text/csv',
    }),
  },
  // The technician's mapping stores the log; nothing is left waiting for the lead.
  'POST /api/cases/:caseId/logs/:pendingUploadId/mapping': {
    params: (f) => ({ caseId: f.openCaseId }),
    body: () => ({ mapping: { time: 0, coolant: 1, temperatureUnit: 'degF' } }),
  },
  'PUT /api/cases/:caseId/logs/:logId/mapping': {
    params: (f) => ({ caseId: f.openCaseId }),
    body: () => ({ mapping: { time: 0, coolant: 1, temperatureUnit: 'degC' } }),
  },
  'GET /api/cases/:caseId/logs/:logId': { params: (f) => ({ caseId: f.openCaseId }) },
  'GET /api/outbox/:messageId/attachments/:attachmentId': {
    params: (f) => ({ attachmentId: f.messageAttachmentId }),
  },
  // The case is already in the casebook: the lead gets the 409 that says so.
  'POST /api/training/cases': {
    body: (f) => ({ caseId: f.caseId, teachingNote: 'Again', difficulty: 'starter' }),
  },
  'PATCH /api/training/cases/:trainingCaseId': { body: () => ({ difficulty: 'practised' }) },
  // Another workshop's lead naming these training cases is refused as bad input (400), told
  // nothing about them.
  'POST /api/training/courses': {
    body: (f) => ({ title: 'Another', apprenticeId: null, trainingCaseIds: [f.trainingCaseId] }),
  },
  'PUT /api/training/courses/:courseId': {
    body: (f) => ({
      title: 'Matrix course',
      apprenticeId: null,
      trainingCaseIds: [f.trainingCaseId],
    }),
  },
  'POST /api/training/courses/:courseId/sign-offs': {
    body: (f) => ({ apprenticeId: f.apprenticeId }),
  },
  'GET /api/training/cases/:trainingCaseId/photos/:attachmentId/:which': {
    params: (f) => {
      const [, , , , , , attachmentId, which] = f.photoPath.split('/');
      return { attachmentId: attachmentId!, which: which! };
    },
  },
  // The lead may read an apprentice's attempt but never answer for them.
  'POST /api/training/attempts/:attemptId/predictions': {
    // The overheating tree's first question is asked (a fault after cooling work is bled first).
    body: () => ({ index: 0, optionId: 'level-cold' }),
  },
};

/** Path values by name, from the fixture; a row's own `params` wins. */
function pathOf(pattern: string, f: AccessFixture, call: Call): string {
  const values: Record<string, string> = {
    caseId: f.caseId,
    userId: f.userId,
    vehicleId: f.vehicleId,
    treeId: f.treeId,
    versionId: f.versionId,
    attachmentId: f.attachmentId,
    format: 'pdf',
    pendingUploadId: f.pendingUploadId,
    logId: f.logId,
    messageId: f.messageId,
    trainingCaseId: f.trainingCaseId,
    courseId: f.courseId,
    apprenticeId: f.apprenticeId,
    attemptId: f.attemptId,
    ...call.params?.(f),
  };
  const path = pattern.replace(/:(\w+)/g, (_m, name: string) => {
    const value = values[name];
    if (!value) throw new Error(`The matrix has no value for :${name} in ${pattern}.`);
    return value;
  });
  const query = call.query?.(f);
  return query ? `${path}?${query}` : path;
}

async function send(f: AccessFixture, actor: ActorName, key: string): Promise<Response> {
  const [method, pattern] = key.split(' ') as [string, string];
  const call = calls[key] ?? {};
  let agent = actor === 'anonymous' ? anonymousAgent(app) : f.agents[actor];
  if (call.ownSession && actor !== 'anonymous') {
    const email =
      actor === 'other' ? (await f.agents.other.get('/api/me')).body.email : emails[actor];
    agent = await signedIn(app, email, testPassword);
  }
  const verb = method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
  const req = agent[verb](pathOf(pattern, f, call));
  if (call.headers) req.set(call.headers());
  if (call.file) {
    const file = await call.file();
    return req.attach(file.field, file.bytes, { filename: file.name, contentType: file.type });
  }
  return call.body ? req.send(call.body(f)) : req;
}

const rows = parseMatrix(matrix);
const order: ActorName[] = ['anonymous', 'other', 'apprentice', 'advisor', 'technician', 'lead'];
let f: AccessFixture;
const emails = {} as Record<Exclude<ActorName, 'anonymous' | 'other'>, string>;

beforeAll(async () => {
  f = await accessFixture(app);
  for (const role of ['technician', 'lead', 'apprentice', 'advisor'] as const)
    emails[role] = (await f.agents[role].get('/api/me')).body.email;
}, 120_000);

describe('the access matrix covers the route table', () => {
  const table = apiRoutes(app).map(routeKey);
  it('has a row for every route the app answers', () => {
    const missing = table.filter((k) => !rows.some((r) => r.key === k));
    expect(missing, 'add a row to the matrix in access-matrix.test.ts').toEqual([]);
  });
  it('has no row for a route the app does not answer, and no row twice', () => {
    const stale = rows.filter((r) => !table.includes(r.key)).map((r) => r.key);
    expect(stale).toEqual([]);
    expect(new Set(rows.map((r) => r.key)).size).toBe(rows.length);
  });
  it('has a way to call every route with a body', () => {
    expect(Object.keys(calls).filter((k) => !rows.some((r) => r.key === k))).toEqual([]);
  });
});

describe('route × person', () => {
  for (const row of rows) {
    it(`${row.key}: ${actors.map((a) => `${a} ${row.expected[a].join('/')}`).join(', ')}`, async () => {
      const got: Record<string, number> = {};
      for (const actor of order) {
        const res = await send(f, actor, row.key);
        got[actor] = res.status;
        if (actor === 'other') {
          const leaked = f.ids.filter((id) => res.text.includes(id));
          expect(leaked, `${row.key} as another workshop's lead`).toEqual([]);
        }
        if (res.status === 401) expect(res.body.error.code).toBe('unauthenticated');
        if (res.status === 403) expect(res.body.error.code).toBe('forbidden');
      }
      const wrong = order.filter((a) => !row.expected[a].includes(got[a]!));
      expect(wrong.map((a) => `${a} got ${got[a]}, expected ${row.expected[a].join('/')}`)).toEqual(
        [],
      );
    });
  }
});
