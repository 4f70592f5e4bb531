// Every training route × every role, and isolation: another workshop's people get 404 for this
// workshop's training cases, courses and attempts, and one apprentice never reaches another's.
import { beforeAll, describe, expect, it } from 'vitest';
import supertest from 'supertest';
import { roles } from '@heatpath/contracts';
import type { Role } from '@heatpath/contracts';
import { clientHeaders, signedIn, testApp } from '../../test/context';
import { createUser, createWorkshopWithTrees, testPassword } from '../../test/factories';
import type { Agent } from '../../test/repair-orders';
import { finishedPersonalCase, markForTraining } from '../../test/training';

const app = testApp();

interface Fixture {
  trainingCaseId: string;
  courseId: string;
  attemptId: string;
  apprenticeId: string;
  photoUrl: string;
  agents: Record<Role, Agent>;
}
let f: Fixture;

beforeAll(async () => {
  const made = await finishedPersonalCase(app);
  const trainingCaseId = await markForTraining(made.lead, made.caseId);
  const course = await made.lead.post('/api/training/courses').send({
    title: 'Access course',
    apprenticeId: null,
    trainingCaseIds: [trainingCaseId],
  });
  const attempt = await made.apprentice.post(`/api/training/cases/${trainingCaseId}/attempts`);
  const replay = await made.apprentice.get(`/api/training/cases/${trainingCaseId}/replay`);
  const photo = replay.body.steps.flatMap((s: { photos: { url: string }[] }) => s.photos)[0];
  const agents = {} as Record<Role, Agent>;
  for (const role of roles)
    agents[role] = await signedIn(app, made.w.people[role].email, testPassword);
  f = {
    trainingCaseId,
    courseId: course.body.id,
    attemptId: attempt.body.id,
    apprenticeId: made.w.people.apprentice.id,
    photoUrl: photo.url,
    agents,
  };
});

interface RouteCase {
  name: string;
  method: 'get' | 'post' | 'patch' | 'put';
  path: () => string;
  body?: () => object;
  allowed: readonly Role[];
  ok: number[];
}

const routes: RouteCase[] = [
  {
    name: 'candidates',
    method: 'get',
    path: () => '/api/training/candidates',
    allowed: ['lead'],
    ok: [200],
  },
  {
    name: 'training cases',
    method: 'get',
    path: () => '/api/training/cases',
    allowed: ['lead'],
    ok: [200],
  },
  {
    name: 'mark',
    method: 'post',
    path: () => '/api/training/cases',
    body: () => ({ caseId: f.trainingCaseId, teachingNote: 'Access', difficulty: 'starter' }),
    allowed: ['lead'],
    ok: [404],
  },
  {
    name: 'update',
    method: 'patch',
    path: () => `/api/training/cases/${f.trainingCaseId}`,
    body: () => ({ difficulty: 'practised' }),
    allowed: ['lead'],
    ok: [200],
  },
  {
    name: 'courses',
    method: 'get',
    path: () => '/api/training/courses',
    allowed: ['lead'],
    ok: [200],
  },
  {
    name: 'create course',
    method: 'post',
    path: () => '/api/training/courses',
    body: () => ({ title: 'Another', apprenticeId: null, trainingCaseIds: [f.trainingCaseId] }),
    allowed: ['lead'],
    ok: [201],
  },
  {
    name: 'save course',
    method: 'put',
    path: () => `/api/training/courses/${f.courseId}`,
    body: () => ({
      title: 'Access course',
      apprenticeId: null,
      trainingCaseIds: [f.trainingCaseId],
    }),
    allowed: ['lead'],
    ok: [200],
  },
  {
    name: 'sign off',
    method: 'post',
    path: () => `/api/training/courses/${f.courseId}/sign-offs`,
    body: () => ({ apprenticeId: f.apprenticeId }),
    allowed: ['lead'],
    ok: [201, 409],
  },
  {
    name: 'progress',
    method: 'get',
    path: () => '/api/training/progress',
    allowed: ['lead'],
    ok: [200],
  },
  {
    name: 'apprentice progress',
    method: 'get',
    path: () => `/api/training/progress/${f.apprenticeId}`,
    allowed: ['lead'],
    ok: [200],
  },
  {
    name: 'casebook',
    method: 'get',
    path: () => '/api/training/casebook',
    allowed: ['lead', 'apprentice'],
    ok: [200],
  },
  {
    name: 'my progress',
    method: 'get',
    path: () => '/api/training/me/progress',
    allowed: ['lead', 'apprentice'],
    ok: [200],
  },
  {
    name: 'replay',
    method: 'get',
    path: () => `/api/training/cases/${f.trainingCaseId}/replay`,
    allowed: ['lead', 'apprentice'],
    ok: [200],
  },
  {
    name: 'tree of a training case',
    method: 'get',
    path: () => `/api/training/cases/${f.trainingCaseId}/tree`,
    allowed: ['lead', 'apprentice'],
    ok: [200],
  },
  {
    name: 'photo',
    method: 'get',
    path: () => f.photoUrl,
    allowed: ['lead', 'apprentice'],
    ok: [200],
  },
  {
    name: 'start attempt',
    method: 'post',
    path: () => `/api/training/cases/${f.trainingCaseId}/attempts`,
    allowed: ['lead', 'apprentice'],
    ok: [201],
  },
  {
    name: 'read attempt',
    method: 'get',
    path: () => `/api/training/attempts/${f.attemptId}`,
    allowed: ['lead', 'apprentice'],
    ok: [200],
  },
  {
    name: 'predict',
    method: 'post',
    path: () => `/api/training/attempts/${f.attemptId}/predictions`,
    body: () => ({ index: 2, optionId: 'glycol-type' }),
    // The lead may read an apprentice's attempt but never answer for them.
    allowed: ['apprentice'],
    ok: [200],
  },
];

describe('training routes × roles', () => {
  for (const route of routes) {
    for (const role of roles) {
      const allowed = route.allowed.includes(role);
      it(`${route.name}: ${role} → ${allowed ? route.ok.join('/') : 403}`, async () => {
        const agent = f.agents[role];
        const req = agent[route.method](route.path());
        const res = await (route.body ? req.send(route.body()) : req);
        if (allowed) expect(route.ok, res.text).toContain(res.status);
        else if (route.name === 'predict' && role === 'lead') expect(res.status).toBe(404);
        else expect(res.status, res.text).toBe(403);
      });
    }
    it(`${route.name}: nobody signed in → 401`, async () => {
      const req = supertest(app)[route.method](route.path()).set(clientHeaders);
      expect((await (route.body ? req.send(route.body()) : req)).status).toBe(401);
    });
  }
});

describe('training isolation', () => {
  it('another workshop’s lead and apprentice reach none of it', async () => {
    const other = await createWorkshopWithTrees();
    const lead = await signedIn(app, other.people.lead.email, testPassword);
    const apprentice = await signedIn(app, other.people.apprentice.email, testPassword);
    for (const agent of [lead, apprentice]) {
      expect((await agent.get(`/api/training/cases/${f.trainingCaseId}/replay`)).status).toBe(404);
      expect((await agent.post(`/api/training/cases/${f.trainingCaseId}/attempts`)).status).toBe(
        404,
      );
      expect((await agent.get(`/api/training/attempts/${f.attemptId}`)).status).toBe(404);
      expect((await agent.get(f.photoUrl)).status).toBe(404);
      expect((await agent.get(`/api/training/cases/${f.trainingCaseId}/tree`)).status).toBe(404);
      expect((await agent.get('/api/training/casebook')).body).toEqual({ courses: [], cases: [] });
    }
    expect(
      (
        await apprentice
          .post(`/api/training/attempts/${f.attemptId}/predictions`)
          .send({ index: 2, optionId: 'glycol-type' })
      ).status,
    ).toBe(404);
    expect(
      (await lead.patch(`/api/training/cases/${f.trainingCaseId}`).send({ withdrawn: true }))
        .status,
    ).toBe(404);
    expect(
      (
        await lead
          .put(`/api/training/courses/${f.courseId}`)
          .send({ title: 'Taken', apprenticeId: null, trainingCaseIds: [f.trainingCaseId] })
      ).status,
    ).toBe(404);
    expect(
      (
        await lead
          .post(`/api/training/courses/${f.courseId}/sign-offs`)
          .send({ apprenticeId: f.apprenticeId })
      ).status,
    ).toBe(404);
    expect((await lead.get(`/api/training/progress/${f.apprenticeId}`)).status).toBe(404);
    expect((await lead.get('/api/training/progress')).body.apprentices).toEqual([
      expect.objectContaining({ attempts: 0, casesReviewed: 0 }),
    ]);
    expect((await lead.get('/api/training/cases')).body.trainingCases).toEqual([]);
  });

  it('one apprentice never reads another’s attempt or scores', async () => {
    const second = await createUser(
      (await f.agents.lead.get('/api/me')).body.workshop.id,
      'apprentice',
    );
    const agent = await signedIn(app, second.email, testPassword);
    expect((await agent.get(`/api/training/attempts/${f.attemptId}`)).status).toBe(404);
    expect(
      (
        await agent
          .post(`/api/training/attempts/${f.attemptId}/predictions`)
          .send({ index: 2, optionId: 'glycol-type' })
      ).status,
    ).toBe(404);
    expect((await agent.get(`/api/training/progress/${f.apprenticeId}`)).status).toBe(403);
    const mine = (await agent.get('/api/training/me/progress')).body;
    expect(mine).toMatchObject({ apprentice: { id: second.id }, attempts: 0, history: [] });
    const casebook = (await agent.get('/api/training/casebook')).body;
    expect(casebook.cases[0]).toMatchObject({ attempts: 0, bestScore: null });
  });
});
