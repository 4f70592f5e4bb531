// Every repair-order and outbox route × every role, unauthenticated, and from another workshop.
// Each test starts from a fresh workshop with a diagnosed case whose revision 1 is approved and
// sent once. Add a row for every new route of this kind.
import { randomUUID } from 'node:crypto';
import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { roles } from '@heatpath/contracts';
import type { Role } from '@heatpath/contracts';
import { clientHeaders, signedIn, testApp } from '../../test/context';
import { testPassword } from '../../test/factories';
import { diagnosedCase } from '../../test/repair-orders';

const app = testApp();

interface Fixture {
  caseId: string;
  messageId: string;
  attachmentId: string;
  findings: Record<string, unknown>;
}

interface RouteCase {
  method: 'get' | 'post' | 'put';
  path: (f: Fixture) => string;
  body?: (f: Fixture) => object;
  allowed: readonly Role[];
  ok: number;
}

const reviewers: Role[] = ['lead', 'advisor'];

const routes: RouteCase[] = [
  {
    method: 'get',
    path: (f) => `/api/cases/${f.caseId}/findings/review`,
    allowed: reviewers,
    ok: 200,
  },
  // After diagnosis only the advisor and lead edit; the technician's edits ended with it.
  {
    method: 'put',
    path: (f) => `/api/cases/${f.caseId}/findings`,
    body: (f) => f.findings,
    allowed: reviewers,
    ok: 200,
  },
  {
    method: 'post',
    path: (f) => `/api/cases/${f.caseId}/findings/approve`,
    body: () => ({ revision: 1 }),
    allowed: reviewers,
    ok: 200,
  },
  ...(['pdf', 'csv', 'json'] as const).map((format): RouteCase => ({
    method: 'get',
    path: (f) => `/api/cases/${f.caseId}/findings/export/${format}`,
    allowed: reviewers,
    ok: 200,
  })),
  {
    method: 'post',
    path: (f) => `/api/cases/${f.caseId}/findings/send`,
    body: () => ({ revision: 1, to: { address: 'front-desk@example.test' }, audience: 'advisor' }),
    allowed: reviewers,
    ok: 201,
  },
  { method: 'get', path: () => '/api/outbox', allowed: ['lead'], ok: 200 },
  {
    method: 'get',
    path: (f) => `/api/outbox/${f.messageId}/attachments/${f.attachmentId}`,
    allowed: ['lead'],
    ok: 200,
  },
  // The message is still queued: the lead gets the 409 that says Heatpath keeps trying.
  { method: 'post', path: (f) => `/api/outbox/${f.messageId}/retry`, allowed: ['lead'], ok: 409 },
];

async function fixture() {
  const d = await diagnosedCase(app, { photo: false });
  const review = await d.advisor.get(`/api/cases/${d.caseId}/findings/review`);
  const c = review.body.current;
  await d.advisor.post(`/api/cases/${d.caseId}/findings/approve`).send({ revision: 1 });
  const sent = await d.advisor
    .post(`/api/cases/${d.caseId}/findings/send`)
    .send({ revision: 1, to: { address: 'customer@example.test' }, audience: 'customer' });
  expect(sent.status, sent.text).toBe(201);
  const outbox = await d.lead.get('/api/outbox');
  const message = outbox.body.messages[0];
  return {
    w: d.w,
    f: {
      caseId: d.caseId,
      messageId: message.id as string,
      attachmentId: message.attachments[0].id as string,
      findings: {
        revision: c.revision,
        concern: c.concern,
        cause: c.cause,
        correction: c.correction,
        parts: c.parts,
        labour: c.labour,
        followUps: c.followUps,
      },
    },
  };
}

const label = (r: RouteCase) =>
  `${r.method.toUpperCase()} ${r.path({ caseId: ':caseId', messageId: ':messageId', attachmentId: ':attachmentId', findings: {} })}`;

describe('repair-order and outbox routes × roles', () => {
  for (const route of routes) {
    for (const role of roles) {
      const allowed = route.allowed.includes(role);
      it(`${label(route)} as ${role} → ${allowed ? route.ok : 403}`, async () => {
        const { w, f } = await fixture();
        const agent = await signedIn(app, w.people[role].email, testPassword);
        const res = await agent[route.method](route.path(f)).send(route.body?.(f));
        expect(res.status, res.text).toBe(allowed ? route.ok : 403);
        if (!allowed) expect(res.body.error.code).toBe('forbidden');
      });
    }
    it(`${label(route)} unauthenticated → 401`, async () => {
      const anonymous = supertest(app);
      const path = route.path({
        caseId: randomUUID(),
        messageId: randomUUID(),
        attachmentId: randomUUID(),
        findings: {},
      });
      const res = await anonymous[route.method](path).set(clientHeaders).send({});
      expect(res.status).toBe(401);
    });
  }

  it('another workshop’s case or message answers 404 on every route that names one', async () => {
    const mine = await fixture();
    const theirs = await fixture();
    const lead = await signedIn(app, mine.w.people.lead.email, testPassword);
    for (const route of routes.filter((r) => r.path(theirs.f) !== '/api/outbox')) {
      const res = await lead[route.method](route.path(theirs.f)).send(route.body?.(theirs.f));
      expect(res.status, `${label(route)}: ${res.text}`).toBe(404);
    }
  });

  it('a case that is not diagnosed has no repair order yet', async () => {
    const { w, f } = await fixture();
    const advisor = await signedIn(app, w.people.advisor.email, testPassword);
    const lead = await signedIn(app, w.people.lead.email, testPassword);
    const open = await lead.post('/api/cases').send({
      vehicleId: (await advisor.get(`/api/cases/${f.caseId}`)).body.vehicle.id,
      complaint: 'Heater blows cold.',
      treeId: (await advisor.get(`/api/cases/${f.caseId}`)).body.tree.treeId,
    });
    const res = await advisor.get(`/api/cases/${open.body.id}/findings/review`);
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/not diagnosed yet/);
  });
});
