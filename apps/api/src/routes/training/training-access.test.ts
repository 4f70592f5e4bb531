// Training isolation: another workshop's people get 404 for this workshop's training cases,
// courses and attempts, and one apprentice never reaches another's. Who may call each training
// route is in the access matrix (routes/access-matrix.test.ts).
import { beforeAll, describe, expect, it } from 'vitest';
import { roles } from '@heatpath/contracts';
import type { Role } from '@heatpath/contracts';
import { signedIn, testApp } from '../../test/context';
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
