// Tree authoring through the API: create, import with every problem listed, drafts with
// optimistic concurrency, publish (clean only), frozen versions, retire, diff, and regression
// replay of finished cases with a confirmation when an outcome changes.
import { describe, expect, it } from 'vitest';
import { signedIn, testApp } from '../../test/context';
import { createVehicle, createWorkshopWithTrees, testPassword } from '../../test/factories';
import {
  overheatingTreeKey,
  stuckShroudOutcome,
  stuckShroudPath,
  walkSteps,
} from '../../test/walks';

const app = testApp();
type Agent = Awaited<ReturnType<typeof signedIn>>;
type Definition = { title: string; nodes: Record<string, Record<string, unknown>> };

async function setup() {
  const w = await createWorkshopWithTrees();
  const lead = await signedIn(app, w.people.lead.email, testPassword);
  return { ...w, lead, treeId: w.trees[overheatingTreeKey]! };
}

/** A case walked to the stuck-shroud outcome and marked diagnosed. */
async function finishedCase(agent: Agent, workshopId: string, treeId: string) {
  const vehicle = await createVehicle(workshopId);
  const kase = await agent
    .post('/api/cases')
    .send({ vehicleId: vehicle.id, complaint: 'Overheats on climbs', treeId });
  await walkSteps(agent, kase.body.id, stuckShroudPath);
  expect((await agent.post(`/api/cases/${kase.body.id}/diagnosed`)).status).toBe(200);
  return kase.body as { id: string; reference: string };
}

describe('tree library and drafts', () => {
  it('lists the shipped trees with their published version and case counts', async () => {
    const { lead } = await setup();
    const res = await lead.get('/api/trees');
    expect(res.status).toBe(200);
    expect(res.body.trees).toHaveLength(3);
    const t = res.body.trees.find((x: { key: string }) => x.key === overheatingTreeKey);
    expect(t).toMatchObject({
      latestPublished: { version: 1, status: 'published', caseCount: 0 },
      draft: null,
    });
  });

  it('creates a blank tree that validates clean, and copies one', async () => {
    const { lead, treeId } = await setup();
    const blank = await lead
      .post('/api/trees')
      .send({ mode: 'blank', title: 'Fan runs all the time', symptom: 'Radiator fan never stops' });
    expect(blank.status).toBe(201);
    expect(blank.body.draft).toMatchObject({ version: 1, status: 'draft', problems: [] });
    const copy = await lead
      .post('/api/trees')
      .send({ mode: 'copy', fromTreeId: treeId, title: 'Overheats (towing edition)' });
    expect(copy.status).toBe(201);
    expect((copy.body.draft.definition as Definition).title).toBe('Overheats (towing edition)');
    expect(copy.body.draft.problems).toEqual([]);
  });

  it('imports a definition with problems as a draft, listing every problem, and refuses a file that is no tree', async () => {
    const { lead } = await setup();
    const broken = {
      format: 'heatpath.tree',
      formatVersion: 1,
      id: 'imported',
      title: 'Imported tree',
      symptom: 'Something odd',
      start: 'ask',
      nodes: {
        ask: {
          kind: 'question',
          title: 'Ask',
          prompt: 'Which?',
          choices: [{ id: 'a', label: 'A', to: 'nowhere' }],
        },
        lonely: { kind: 'outcome', title: 'Lonely', rootCause: 'x', correction: 'y' },
      },
    };
    const res = await lead.post('/api/trees').send({ mode: 'import', definition: broken });
    expect(res.status).toBe(201);
    const codes = res.body.draft.problems.map((p: { code: string }) => p.code);
    expect(codes).toEqual(expect.arrayContaining(['unknown-target', 'unreachable']));
    const notATree = await lead
      .post('/api/trees')
      .send({ mode: 'import', definition: { hello: 'world' } });
    expect(notATree.status).toBe(400);
    expect(notATree.body.error.message).toMatch(/not a Heatpath tree/);
  });

  it('refuses a stale draft save with 409 and keeps the other person’s change', async () => {
    const { lead, treeId, people } = await setup();
    const draft = await lead.post(`/api/trees/${treeId}/draft`).send({});
    expect(draft.status).toBe(201);
    expect(draft.body).toMatchObject({
      version: 2,
      status: 'draft',
      revision: 1,
      basedOnVersion: 1,
    });
    const mine = structuredClone(draft.body.definition) as Definition;
    mine.nodes['visual-leaks']!.prompt = 'Mine';
    const other = await signedIn(app, people.lead.email, testPassword);
    const theirs = structuredClone(draft.body.definition) as Definition;
    theirs.nodes['visual-leaks']!.prompt = 'Theirs';
    expect(
      (await other.put(`/api/trees/${treeId}/draft`).send({ revision: 1, definition: theirs }))
        .status,
    ).toBe(200);
    const stale = await lead
      .put(`/api/trees/${treeId}/draft`)
      .send({ revision: 1, definition: mine });
    expect(stale.status).toBe(409);
    expect(stale.body.error.message).toMatch(/Someone else saved/);
    const now = await lead.get(`/api/trees/${treeId}/draft`);
    expect((now.body.definition as Definition).nodes['visual-leaks']!.prompt).toBe('Theirs');
    expect(now.body.revision).toBe(2);
    // A second draft of the same tree is refused.
    expect((await lead.post(`/api/trees/${treeId}/draft`).send({})).status).toBe(409);
  });

  it('saves a draft with problems but will not publish it', async () => {
    const { lead, treeId } = await setup();
    const draft = await lead.post(`/api/trees/${treeId}/draft`).send({});
    const def = structuredClone(draft.body.definition) as Definition;
    (def.nodes['visual-leaks']!.choices as { to: string }[])[0]!.to = 'no-such-step';
    const saved = await lead
      .put(`/api/trees/${treeId}/draft`)
      .send({ revision: 1, definition: def });
    expect(saved.status).toBe(200);
    expect(saved.body.problems).toEqual(
      expect.arrayContaining([
        expect.objectContaining({ code: 'unknown-target', nodeId: 'visual-leaks' }),
      ]),
    );
    const publish = await lead
      .post(`/api/trees/${treeId}/draft/publish`)
      .send({ revision: 2, changeNote: 'Broken on purpose' });
    expect(publish.status).toBe(409);
    expect(publish.body.error.message).toMatch(/problem\(s\) to fix/);
    expect(publish.body.error.reason).toBe('draft_has_problems');
    const stale = await lead
      .post(`/api/trees/${treeId}/draft/publish`)
      .send({ revision: 1, changeNote: 'Reviewed an older revision' });
    expect(stale.status).toBe(409);
    expect(stale.body.error.reason).toBe('stale_revision');
  });

  it('publishes version 2, records who and why, freezes it, diffs it and retires version 1', async () => {
    const { lead, treeId, people } = await setup();
    const draft = await lead.post(`/api/trees/${treeId}/draft`).send({});
    const def = structuredClone(draft.body.definition) as Definition;
    def.nodes['visual-leaks']!.prompt = 'Look under the car and around the engine bay for coolant.';
    await lead.put(`/api/trees/${treeId}/draft`).send({ revision: 1, definition: def });
    const published = await lead
      .post(`/api/trees/${treeId}/draft/publish`)
      .send({ revision: 2, changeNote: 'Clearer leak prompt' });
    expect(published.status).toBe(200);
    expect(published.body).toMatchObject({
      version: 2,
      status: 'published',
      changeNote: 'Clearer leak prompt',
      publishedBy: { id: people.lead.id },
    });
    // No draft any more: nothing to save into; the published version stays as it was.
    expect(
      (await lead.put(`/api/trees/${treeId}/draft`).send({ revision: 2, definition: def })).status,
    ).toBe(404);
    const library = await lead.get(`/api/trees/${treeId}`);
    const v1 = library.body.versions.find((v: { version: number }) => v.version === 1);
    const diff = await lead
      .get(`/api/trees/${treeId}/diff`)
      .query({ from: v1.id, to: published.body.id });
    expect(diff.status).toBe(200);
    expect(diff.body.diff.changed).toEqual([
      expect.objectContaining({
        nodeId: 'visual-leaks',
        changes: [
          expect.objectContaining({
            field: 'Question',
            after: 'Look under the car and around the engine bay for coolant.',
          }),
        ],
      }),
    ]);
    const retired = await lead.post(`/api/trees/${treeId}/versions/${v1.id}/retire`);
    expect(retired.body.status).toBe('retired');
    const exported = await lead.get(`/api/trees/${treeId}/versions/${published.body.id}/export`);
    expect(exported.headers['content-disposition']).toMatch(
      /attachment; filename=".*-v2\.heatpath-tree\.json"/,
    );
    expect(JSON.parse(exported.text).nodes['visual-leaks'].prompt).toMatch(/Look under the car/);
  });

  it('replays finished cases against a draft and asks for confirmation when a regression case changes outcome', async () => {
    const { lead, treeId, workshop } = await setup();
    const kase = await finishedCase(lead, workshop.id, treeId);
    const other = await finishedCase(lead, workshop.id, treeId);
    expect(
      (await lead.put(`/api/trees/${treeId}/regression-set`).send({ caseIds: [kase.id] })).status,
    ).toBe(200);

    const draft = await lead.post(`/api/trees/${treeId}/draft`).send({});
    const def = structuredClone(draft.body.definition) as Definition;
    // The shroud answer now leads to the impeller check instead of the stuck-shroud finding.
    (def.nodes['shroud-inspection']!.choices as { id: string; to: string }[]).find(
      (c) => c.id === 'stuck-out',
    )!.to = 'impeller-inspection';
    delete def.nodes['pump-shroud-stuck'];
    await lead.put(`/api/trees/${treeId}/draft`).send({ revision: 1, definition: def });

    const report = await lead.post(`/api/trees/${treeId}/draft/regression`);
    expect(report.status, report.text).toBe(200);
    const mine = report.body.results.find((r: { caseId: string }) => r.caseId === kase.id);
    expect(mine).toMatchObject({
      verdict: 'no-outcome',
      inRegressionSet: true,
      expectedOutcome: stuckShroudOutcome,
      fromVersion: 1,
      // Where it stopped: the step after the last recorded answer, the new impeller check.
      divergence: {
        step: stuckShroudPath.length + 1,
        nodeId: 'impeller-inspection',
        reason: expect.stringMatching(/never answered/),
      },
    });
    expect(
      report.body.results.find((r: { caseId: string }) => r.caseId === other.id).inRegressionSet,
    ).toBe(false);

    // Make the answer lead to a different finding outright.
    (def.nodes['shroud-inspection']!.choices as { id: string; to: string }[]).find(
      (c) => c.id === 'stuck-out',
    )!.to = 'pump-impeller-not-circulating';
    await lead.put(`/api/trees/${treeId}/draft`).send({ revision: 2, definition: def });
    const second = await lead.post(`/api/trees/${treeId}/draft/regression`);
    expect(second.body.results.find((r: { caseId: string }) => r.caseId === kase.id)).toMatchObject(
      { verdict: 'different-outcome', newOutcome: 'pump-impeller-not-circulating' },
    );

    const refused = await lead
      .post(`/api/trees/${treeId}/draft/publish`)
      .send({ revision: 3, changeNote: 'Shroud path rethought' });
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toContain(kase.reference);
    expect(refused.body.error.reason).toBe('regression_outcomes_changed');
    const confirmed = await lead
      .post(`/api/trees/${treeId}/draft/publish`)
      .send({ revision: 3, changeNote: 'Shroud path rethought', confirmChangedOutcomes: true });
    expect(confirmed.status).toBe(200);
    expect(confirmed.body.publishConfirmation).toMatchObject({
      changedCases: [
        { caseId: kase.id, from: stuckShroudOutcome, to: 'pump-impeller-not-circulating' },
      ],
    });
  });

  it('reports where a recorded walk diverges from a draft that removed its step', async () => {
    const { lead, treeId, workshop } = await setup();
    const kase = await finishedCase(lead, workshop.id, treeId);
    const draft = await lead.post(`/api/trees/${treeId}/draft`).send({});
    const def = structuredClone(draft.body.definition) as Definition;
    (def.nodes['glycol-type']!.choices as { id: string; to: string }[]).find(
      (c) => c.id === 'ethylene',
    )!.to = 'cap-test';
    delete def.nodes['concentration-eg'];
    const computed = (def as unknown as { computed: { name: string }[] }).computed;
    computed.splice(
      computed.findIndex((c) => c.name === 'egProtection'),
      1,
    );
    await lead.put(`/api/trees/${treeId}/draft`).send({ revision: 1, definition: def });
    const report = await lead.post(`/api/trees/${treeId}/draft/regression`);
    expect(report.status, report.text).toBe(200);
    const r = report.body.results.find((x: { caseId: string }) => x.caseId === kase.id);
    expect(r.verdict).toBe('diverged');
    expect(r.divergence).toMatchObject({ step: 5, nodeId: 'cap-test' });
    expect(r.divergence.reason.length).toBeGreaterThan(10);
  });
});

describe('tree roles', () => {
  it('lets technicians and advisors read published trees but never drafts or edits; apprentices get nothing', async () => {
    const { lead, treeId, people } = await setup();
    await lead.post(`/api/trees/${treeId}/draft`).send({});
    for (const role of ['technician', 'advisor'] as const) {
      const agent = await signedIn(app, people[role].email, testPassword);
      const list = await agent.get('/api/trees');
      expect(list.status).toBe(200);
      expect(list.body.trees.every((t: { draft: unknown }) => t.draft === null)).toBe(true);
      expect((await agent.get(`/api/trees/${treeId}/draft`)).status).toBe(403);
      expect(
        (
          await agent
            .post('/api/trees')
            .send({ mode: 'blank', title: 'Nope nope', symptom: 'Nope nope' })
        ).status,
      ).toBe(403);
    }
    const apprentice = await signedIn(app, people.apprentice.email, testPassword);
    expect((await apprentice.get('/api/trees')).status).toBe(403);
  });

  it('answers 404 for another workshop’s tree', async () => {
    const mine = await setup();
    const theirs = await setup();
    expect((await mine.lead.get(`/api/trees/${theirs.treeId}`)).status).toBe(404);
    expect((await mine.lead.post(`/api/trees/${theirs.treeId}/draft`).send({})).status).toBe(404);
    expect(
      (
        await mine.lead
          .post('/api/trees')
          .send({ mode: 'copy', fromTreeId: theirs.treeId, title: 'Stolen tree' })
      ).status,
    ).toBe(404);
  });
});
