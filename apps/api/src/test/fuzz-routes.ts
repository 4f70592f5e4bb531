// Property-based fuzzing of every route that changes something: requests built by fast-check
// from arbitrary JSON, strings with NUL and lone surrogates, huge numbers, wrong types, path
// values that are not ids, bodies that are not JSON and encodings that lie. The property: no
// answer is a 5xx, and no answer shows a stack, SQL or a file path. Shared by the API test (a few
// dozen inputs per route) and `npm run fuzz` (thousands).
import { randomUUID } from 'node:crypto';
import fc from 'fast-check';
import type { Express } from 'express';
import type supertest from 'supertest';
import type { RouteEntry } from './route-table';

/** What an answer must never show: a stack frame, a file path, or a database's own words. */
const leakPatterns = [
  /\n\s+at |\bat [\w$.<>]+ \((?:\/|file:|node:)|\bat (?:\/|file:|node:)/,
  /\.[cm]?[jt]sx?:\d+|node_modules|\/(?:work|root|home|tmp|var|usr|opt)\//,
  /Sequelize|SQLSTATE|syntax error at|violates .+ constraint|relation "|invalid byte sequence/i,
  // SQL as PostgreSQL and Sequelize write it, in capitals (a tree's own prose says "update").
  /\b(?:SELECT|INSERT INTO|UPDATE|DELETE FROM)\b[^"]{0,200}\b(?:FROM|VALUES|SET|WHERE|RETURNING)\b/,
];

export function leakIn(text: string): string | null {
  for (const pattern of leakPatterns) {
    const found = pattern.exec(text);
    if (found) return found[0];
  }
  return null;
}

export interface FuzzRequest {
  path: string;
  contentType: string | null;
  contentEncoding: string | null;
  body: string | null;
}

export interface FuzzFailure {
  request: FuzzRequest;
  status: number;
  text: string;
  reason: string;
}

export interface FuzzTally {
  route: string;
  requests: number;
  statuses: Record<string, number>;
  failure: FuzzFailure | null;
}

// Field names Heatpath's requests use, so generated objects reach deep into validation.
const knownKeys = [
  'email', 'password', 'token', 'name', 'role', 'units', 'volume', 'plate', 'make', 'model', 'vin',
  'year', 'customerId', 'newCustomer', 'vehicleId', 'treeId', 'complaint', 'mileageAtIntake',
  'idempotencyKey', 'event', 'type', 'nodeId', 'position', 'choiceId', 'readings', 'value',
  'unit', 'result', 'text', 'revision', 'concern', 'cause', 'correction', 'parts', 'labour',
  'followUps', 'photoIds', 'to', 'address', 'audience', 'note', 'mode', 'title', 'symptom',
  'fromTreeId', 'fromVersionId', 'definition', 'changeNote', 'confirmChangedOutcomes', 'caseIds',
  'mapping', 'time', 'coolant', 'temperatureUnit', 'caseId', 'teachingNote', 'difficulty',
  'hideNotes', 'hiddenAttachmentIds', 'withdrawn', 'apprenticeId', 'trainingCaseIds', 'index',
  'optionId', 'active', 'preferences', '__proto__', 'constructor',
]; // prettier-ignore

const nastyStrings = [
  '\u0000',
  'note\u0000with a NUL',
  '\ud800',
  'lone \udfff low',
  'high at end \ud83d',
  '\ufeff',
  "'; DROP TABLE cases; --",
  '../../../../etc/passwd',
  '%00',
  '%E0%A4%A',
  '<script>alert(1)</script>',
  '{{7*7}}',
  '${process.env}',
  'x'.repeat(70_000),
  '𝔥𝔢𝔞𝔱',
  '   ',
  '',
]; // prettier-ignore

const hugeNumbers = ['1e309', '-1e309', '123456789012345678901234567890', '9007199254740993', '-0', '1e-400', '0x10']; // prettier-ignore

const text = fc.oneof(
  { weight: 3, arbitrary: fc.constantFrom(...nastyStrings) },
  { weight: 3, arbitrary: fc.string({ unit: 'binary', maxLength: 40 }) },
  { weight: 2, arbitrary: fc.string({ maxLength: 40 }) },
  { weight: 1, arbitrary: fc.uuid() },
);

const number = fc.oneof(
  fc.integer(),
  fc.double(),
  fc.constantFrom(0, -1, 1, 2 ** 31, -(2 ** 53), Number.MAX_SAFE_INTEGER + 2, 1e21, 1e308),
);

// Any JSON value built from the nasty parts, objects mostly keyed by names the API knows.
const { value } = fc.letrec<{ value: unknown }>((tie) => ({
  value: fc.oneof(
    { depthSize: 'small', withCrossShrink: true },
    text,
    number,
    fc.boolean(),
    fc.constant(null),
    fc.array(tie('value'), { maxLength: 4 }),
    fc.dictionary(
      fc.oneof(fc.constantFrom(...knownKeys), fc.string({ maxLength: 8 })),
      tie('value'),
      {
        maxKeys: 6,
      },
    ),
  ),
}));

// A body as the bytes on the wire: JSON (with lone surrogates escaped as JSON does), JSON with
// a number no double holds, or text that is not JSON at all.
const body: fc.Arbitrary<string | null> = fc.oneof(
  { weight: 6, arbitrary: value.map((v) => JSON.stringify(v) ?? 'null') },
  { weight: 2, arbitrary: fc.jsonValue().map((v) => JSON.stringify(v)) },
  {
    weight: 1,
    arbitrary: fc
      .tuple(fc.constantFrom(...knownKeys), fc.constantFrom(...hugeNumbers))
      .map(([k, n]) => `{"${k}": ${n}, "revision": ${n}}`),
  },
  { weight: 1, arbitrary: fc.string({ maxLength: 60 }) },
  { weight: 1, arbitrary: fc.constant(null) },
);

const contentType = fc.oneof(
  { weight: 8, arbitrary: fc.constant('application/json') },
  {
    weight: 2,
    arbitrary: fc.constantFrom(
      'application/json; charset=utf-16',
      'application/json; charset=latin1',
      'text/plain',
      'application/x-www-form-urlencoded',
      'multipart/form-data; boundary=heatpath',
      'multipart/form-data',
      'application/octet-stream',
    ),
  },
  { weight: 1, arbitrary: fc.constant(null) },
);

const contentEncoding = fc.oneof(
  { weight: 12, arbitrary: fc.constant(null) },
  { weight: 1, arbitrary: fc.constantFrom('gzip', 'deflate', 'br', 'identity', 'x-heatpath') },
);

/** A path value: mostly a real id, else another id, or something that is no id at all. */
function param(valid: string | undefined): fc.Arbitrary<string> {
  const junk = fc.oneof(
    fc.uuid(),
    fc.constantFrom(
      'not-an-id',
      '0',
      '-1',
      '..',
      '%00',
      '%E0%A4%A',
      '%ZZ',
      'null',
      'x'.repeat(5000),
    ),
    fc.string({ unit: 'binary', minLength: 1, maxLength: 20 }).map(encodeURIComponent),
  );
  return valid
    ? fc.oneof({ weight: 3, arbitrary: fc.constant(valid) }, { weight: 2, arbitrary: junk })
    : junk;
}

export function requestsFor(route: RouteEntry, ids: Record<string, string>) {
  const names = [...route.path.matchAll(/:(\w+)/g)].map((m) => m[1]!);
  return fc
    .record({
      params: fc.tuple(...names.map((n) => param(ids[n]))),
      body,
      contentType,
      contentEncoding,
    })
    .map(({ params, ...rest }): FuzzRequest => {
      let i = 0;
      return { path: route.path.replace(/:(\w+)/g, () => params[i++]!), ...rest };
    });
}

type Agent = ReturnType<typeof supertest.agent>;

/** Sends one request; returns why its answer is wrong, or null. */
async function check(agent: Agent, route: RouteEntry, request: FuzzRequest, tally: FuzzTally) {
  const verb = route.method.toLowerCase() as 'post' | 'put' | 'patch' | 'delete';
  const req = agent[verb](request.path)
    // Each request from an address of its own (TEST-NET-3): per-address limits stay untouched.
    .set('X-Forwarded-For', `203.0.113.${Math.floor(Math.random() * 250) + 1}`)
    .set('Idempotency-Key', randomUUID());
  if (request.contentType) req.set('Content-Type', request.contentType);
  if (request.contentEncoding) req.set('Content-Encoding', request.contentEncoding);
  const res = await (request.body === null ? req : req.send(request.body));
  tally.requests += 1;
  tally.statuses[res.status] = (tally.statuses[res.status] ?? 0) + 1;
  const text = res.text ?? '';
  if (res.status >= 500) return { status: res.status, text, reason: `answered ${res.status}` };
  const leak = leakIn(text);
  if (leak) return { status: res.status, text, reason: `the answer shows "${leak}"` };
  return null;
}

/**
 * Fuzzes one route with `runs` generated requests (fast-check shrinks a failure to a small
 * one). `agent` is signed in as the person to send as, on an app that trusts X-Forwarded-For.
 */
export async function fuzzRoute(options: {
  app: Express;
  agent: Agent;
  route: RouteEntry;
  ids: Record<string, string>;
  runs: number;
  seed?: number;
}): Promise<FuzzTally> {
  const { agent, route, ids, runs } = options;
  const tally: FuzzTally = {
    route: `${route.method} ${route.path}`,
    requests: 0,
    statuses: {},
    failure: null,
  };
  const result = await fc.check(
    fc.asyncProperty(requestsFor(route, ids), async (request) => {
      const wrong = await check(agent, route, request, tally);
      if (wrong) {
        tally.failure = { request, ...wrong, text: wrong.text.slice(0, 500) };
        return false;
      }
      return true;
    }),
    { numRuns: runs, ...(options.seed === undefined ? {} : { seed: options.seed }) },
  );
  // The last failure recorded is the shrunk one fast-check reports.
  if (!result.failed) tally.failure = null;
  else if (!tally.failure) {
    // The request itself failed (a dropped connection, a hung answer): as bad as a 5xx.
    tally.failure = {
      request: result.counterexample?.[0] ?? {
        path: route.path,
        contentType: null,
        contentEncoding: null,
        body: null,
      },
      status: 0,
      text: '',
      reason: `the request failed: ${String(result.errorInstance ?? 'unknown')}`,
    };
  }
  return tally;
}

/** The routes that change something. */
export const isMutating = (route: RouteEntry) => route.method !== 'GET';
