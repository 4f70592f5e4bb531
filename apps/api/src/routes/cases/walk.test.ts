// The guided walk through the API: a full walk of the shipped overheating tree to the
// stuck-shroud outcome, the replay guard (stale, duplicate, retried), step back, readings in
// other units, range errors, pinning across a new tree version, required evidence, and diagnosis.
import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import type { Sequelize } from 'sequelize';
import { Attachment, TreeVersion } from '../../db/models/index';
import { signedIn, testApp, testSequelize } from '../../test/context';
import { createVehicle, createWorkshopWithTrees, testPassword } from '../../test/factories';
import {
  attachRequiredEvidence,
  evidenceLog,
  evidencePhoto,
  overheatingTreeKey,
  stuckShroudOutcome,
  stuckShroudPath,
  walkSteps,
} from '../../test/walks';

const app = testApp();

async function openCase(treeKey = overheatingTreeKey) {
  const w = await createWorkshopWithTrees();
  const vehicle = await createVehicle(w.workshop.id);
  const tech = await signedIn(app, w.people.technician.email, testPassword);
  const res = await tech.post('/api/cases').send({
    vehicleId: vehicle.id,
    complaint: 'Overheats now and then on long climbs.',
    treeId: w.trees[treeKey],
  });
  expect(res.status).toBe(201);
  return { ...w, tech, caseId: res.body.id as string, created: res.body };
}

type Agent = Awaited<ReturnType<typeof signedIn>>;

async function answer(
  agent: Agent,
  caseId: string,
  step: (typeof stuckShroudPath)[number],
  position: number,
  key = randomUUID(),
) {
  return agent
    .post(`/api/cases/${caseId}/walk`)
    .send({ idempotencyKey: key, event: { ...step.answer, nodeId: step.nodeId, position } });
}

describe('walking a case', () => {
  it('reaches the stuck-shroud outcome step by step and drafts the findings', async () => {
    const { tech, caseId, created } = await openCase();
    let position = 0;
    let currentNode = created.walk.currentNode;
    const replies: { case: Record<string, unknown> }[] = [];
    for (const step of stuckShroudPath) {
      // Where a step requires a photo (the block test's fluid, the pump's impeller side), the
      // technician takes it first.
      await attachRequiredEvidence(tech, caseId, currentNode);
      const res = await answer(tech, caseId, step, position);
      expect(res.status, `${step.nodeId}: ${res.text}`).toBe(201);
      position = res.body.walk.position;
      currentNode = res.body.walk.currentNode;
      replies.push(res.body);
    }
    const kase = await tech.get(`/api/cases/${caseId}`);
    // Every reply says what the answer changed, as the case page would read it afterwards.
    expect(replies[0]!.case).toMatchObject({
      status: 'in_diagnosis',
      diagnosedAt: null,
      findings: null,
      can: { walk: true, editFindings: true, markDiagnosed: false },
    });
    expect(replies.at(-2)!.case.findings).toBeNull();
    const { status, updatedAt, diagnosedAt, can, findings } = kase.body;
    expect(replies.at(-1)!.case).toEqual({ status, updatedAt, diagnosedAt, can, findings });
    expect(kase.body.status).toBe('in_diagnosis');
    expect(kase.body.walk).toMatchObject({
      status: 'reached-outcome',
      currentNodeId: stuckShroudOutcome,
    });
    expect(kase.body.walk.path).toHaveLength(stuckShroudPath.length);
    const drop = kase.body.walk.computed.find((c: { name: string }) => c.name === 'radiatorDrop');
    expect(drop.value).toBeCloseTo(7, 6); // 52 °C in, 45 °C out: worked by hand.
    expect(kase.body.findings).toMatchObject({
      outcomeNodeId: stuckShroudOutcome,
      concern: 'Overheats now and then on long climbs.',
      revision: 1,
    });
    expect(kase.body.findings.cause).toMatch(/Readings on the way there: .*110 °C/);
    expect(kase.body.findings.parts.length).toBeGreaterThan(0);
    expect(kase.body.findings.followUps.join(' ')).toMatch(/timing cover/i);
    expect(kase.body.can.markDiagnosed).toBe(true);

    const diagnosed = await tech.post(`/api/cases/${caseId}/diagnosed`);
    expect(diagnosed.status).toBe(200);
    expect(diagnosed.body.status).toBe('diagnosed');
    const late = await answer(
      tech,
      caseId,
      { nodeId: stuckShroudOutcome, answer: { type: 'answer.choice', choiceId: 'x' } },
      position,
    );
    expect(late.status).toBe(409);

    const audit = await tech.get(`/api/cases/${caseId}/events`);
    // Every answer, the photos the walk required and "diagnosed".
    expect(audit.body.events.length).toBe(
      stuckShroudPath.length + kase.body.attachments.length + 1,
    );
    expect(kase.body.attachments.map((a: { nodeId: string }) => a.nodeId)).toEqual([
      'block-test-result',
      'pump-removal',
    ]);
    expect(audit.body.events[0]).toMatchObject({
      seq: 1,
      kind: 'answer',
      actor: { name: expect.any(String) },
    });
  });

  it('accepts a retried answer once (same idempotency key) and refuses a stale one with 409', async () => {
    const { tech, caseId, people } = await openCase();
    const key = randomUUID();
    const first = await answer(tech, caseId, stuckShroudPath[0]!, 0, key);
    expect(first.status).toBe(201);
    const retried = await answer(tech, caseId, stuckShroudPath[0]!, 0, key);
    expect(retried.status).toBe(200);
    expect(retried.body.repeated).toBe(true);
    expect(retried.body.walk.position).toBe(1);
    expect(retried.body.case).toEqual(first.body.case);
    // The same answer again with a new key is a duplicate submit from a stale screen.
    const duplicate = await answer(tech, caseId, stuckShroudPath[0]!, 0);
    expect(duplicate.status).toBe(409);
    expect(duplicate.body.error.message).toMatch(/reload/i);
    // A second device still showing the first step.
    const lead = await signedIn(app, people.lead.email, testPassword);
    const stale = await answer(
      lead,
      caseId,
      { nodeId: 'interview-pattern', answer: { type: 'answer.choice', choiceId: 'no-pattern' } },
      0,
    );
    expect(stale.status).toBe(409);
    const kase = await tech.get(`/api/cases/${caseId}`);
    expect(kase.body.walk.path).toHaveLength(1);
    expect(kase.body.walk.currentNodeId).toBe('level-cold');
  });

  it('answers two concurrent submits for the same step exactly once', async () => {
    const { tech, caseId } = await openCase();
    const [a, b] = await Promise.all([
      answer(tech, caseId, stuckShroudPath[0]!, 0),
      answer(tech, caseId, stuckShroudPath[0]!, 0),
    ]);
    expect([a.status, b.status].sort()).toEqual([201, 409]);
  });

  it('steps back as an event and keeps the history', async () => {
    const { tech, caseId } = await openCase();
    await answer(tech, caseId, stuckShroudPath[0]!, 0);
    await answer(tech, caseId, stuckShroudPath[1]!, 1);
    const back = await tech.post(`/api/cases/${caseId}/walk`).send({
      idempotencyKey: randomUUID(),
      event: { type: 'walk.back', nodeId: 'visual-leaks', position: 2 },
    });
    expect(back.status).toBe(201);
    expect(back.body.walk.currentNodeId).toBe('level-cold');
    expect(back.body.walk.history).toHaveLength(3);
    expect(back.body.walk.path).toHaveLength(1);
    const audit = await tech.get(`/api/cases/${caseId}/events`);
    expect(audit.body.events.map((e: { kind: string }) => e.kind)).toEqual([
      'answer',
      'answer',
      'back',
    ]);
  });

  it('takes readings in °F and psi, and names the allowed range when a reading is impossible', async () => {
    const { tech, caseId } = await openCase();
    const toWarmUp = stuckShroudPath.findIndex((s) => s.nodeId === 'warm-up-live-data');
    const { position } = (await walkSteps(tech, caseId, stuckShroudPath.slice(0, toWarmUp))).walk;
    // 230 °F is 110 °C and 222.8 °F is 106 °C (°C = (°F − 32) × 5/9, the defining relation).
    const imperial = {
      nodeId: 'warm-up-live-data',
      answer: {
        type: 'answer.measurement' as const,
        readings: {
          liveDataTemp: { value: 230, unit: 'degF' },
          sensorHousingIr: { value: 222.8, unit: 'degF' },
        },
      },
    };
    const tooHot = {
      nodeId: 'warm-up-live-data',
      answer: {
        type: 'answer.measurement' as const,
        readings: {
          liveDataTemp: { value: 400, unit: 'degC' },
          sensorHousingIr: { value: 100, unit: 'degC' },
        },
      },
    };
    const refused = await answer(tech, caseId, tooHot, position);
    expect(refused.status).toBe(400);
    expect(refused.body.error.fields.liveDataTemp).toMatch(/150/);
    const wrongUnit = await answer(
      tech,
      caseId,
      {
        nodeId: 'warm-up-live-data',
        answer: {
          type: 'answer.measurement',
          readings: {
            liveDataTemp: { value: 1, unit: 'bar' },
            sensorHousingIr: { value: 100, unit: 'degC' },
          },
        },
      },
      position,
    );
    expect(wrongUnit.status).toBe(400);
    const ok = await answer(tech, caseId, imperial, position);
    expect(ok.status).toBe(201);
    const reading = ok.body.walk.readings.find((r: { name: string }) => r.name === 'liveDataTemp');
    expect(reading.canonical.value).toBeCloseTo(110, 6);
    expect(reading.display).toMatch(/230 °F/);
  });

  it('keeps a case on its pinned version when a new version is published mid-case', async () => {
    const { tech, caseId, trees, people, workshop } = await openCase();
    await answer(tech, caseId, stuckShroudPath[0]!, 0);
    const v1 = await TreeVersion.findOne({
      where: { treeId: trees[overheatingTreeKey], version: 1 },
    });
    const definition = structuredClone(v1!.definition) as {
      nodes: Record<
        string,
        {
          kind: string;
          choices?: { id: string; label: string; to: string }[];
          couldNotDo?: string;
        }
      >;
    };
    // Version 2 drops the level check: every way that led to it (the interview's answers, the
    // bleed-first steps) goes straight to the visual check.
    for (const node of Object.values(definition.nodes)) {
      for (const choice of node.choices ?? [])
        if (choice.to === 'level-cold') choice.to = 'visual-leaks';
      if (node.couldNotDo === 'level-cold') node.couldNotDo = 'visual-leaks';
    }
    delete definition.nodes['level-cold'];
    await TreeVersion.create({
      treeId: trees[overheatingTreeKey]!,
      workshopId: workshop.id,
      version: 2,
      status: 'published',
      definition,
      changeNote: 'Skip the level check',
      createdBy: people.lead.id,
      publishedBy: people.lead.id,
      publishedAt: new Date(),
    });
    const kase = await tech.get(`/api/cases/${caseId}`);
    expect(kase.body.tree.version).toBe(1);
    expect(kase.body.walk.currentNodeId).toBe('level-cold');
    expect((await answer(tech, caseId, stuckShroudPath[1]!, 1)).status).toBe(201);
    const fresh = await tech.post('/api/cases').send({
      vehicleId: kase.body.vehicle.id,
      complaint: 'Another visit',
      treeId: trees[overheatingTreeKey],
    });
    expect(fresh.body.tree.version).toBe(2);
  });

  it('refuses, in the database itself, any change to a published version', async () => {
    const { trees } = await openCase();
    const sequelize: Sequelize = testSequelize();
    await expect(
      sequelize.query(
        `UPDATE tree_versions SET definition = '{}'::jsonb WHERE tree_id = '${trees[overheatingTreeKey]}' AND version = 1`,
      ),
    ).rejects.toThrow(/cannot be changed/);
    await expect(
      sequelize.query(`DELETE FROM tree_versions WHERE tree_id = '${trees[overheatingTreeKey]}'`),
    ).rejects.toThrow(/cannot be deleted/);
  });

  it('saves edited findings with revision checks, and refuses a stale save', async () => {
    const { tech, caseId } = await openCase();
    const reached = await walkSteps(tech, caseId, stuckShroudPath);
    const f = reached.case.findings!;
    const edit = {
      revision: f.revision,
      concern: f.concern,
      cause: f.cause,
      correction: `${f.correction} Customer approved by phone.`,
      parts: [...f.parts, { description: 'Coolant, 50 % pre-mix', quantity: 6, partNumber: null }],
      labour: f.labour,
      followUps: f.followUps,
    };
    const saved = await tech.put(`/api/cases/${caseId}/findings`).send(edit);
    expect(saved.status).toBe(200);
    expect(saved.body.findings.revision).toBe(f.revision + 1);
    expect(saved.body.findings.correction).toMatch(/approved by phone/);
    const stale = await tech.put(`/api/cases/${caseId}/findings`).send(edit);
    expect(stale.status).toBe(409);
    expect(stale.body.error.message).toMatch(/reload/);
    const bad = await tech
      .put(`/api/cases/${caseId}/findings`)
      .send({ ...edit, revision: f.revision + 1, parts: [{ description: '', quantity: -1 }] });
    expect(bad.status).toBe(400);
  });

  it('lets an advisor read the case and findings but not walk or edit', async () => {
    const { caseId, people, tech } = await openCase();
    await answer(tech, caseId, stuckShroudPath[0]!, 0);
    const advisor = await signedIn(app, people.advisor.email, testPassword);
    const kase = await advisor.get(`/api/cases/${caseId}`);
    expect(kase.status).toBe(200);
    expect(kase.body.can).toEqual({ walk: false, editFindings: false, markDiagnosed: false });
    expect((await answer(advisor, caseId, stuckShroudPath[1]!, 1)).status).toBe(403);
    expect(
      (
        await advisor
          .post(`/api/cases/${caseId}/notes`)
          .send({ idempotencyKey: randomUUID(), text: 'Hi' })
      ).status,
    ).toBe(403);
  });

  it('stores notes once per idempotency key, with who and when', async () => {
    const { tech, caseId } = await openCase();
    const key = randomUUID();
    const a = await tech.post(`/api/cases/${caseId}/notes`).send({
      idempotencyKey: key,
      nodeId: 'interview-pattern',
      text: 'Customer tows a caravan in summer.',
    });
    const b = await tech.post(`/api/cases/${caseId}/notes`).send({
      idempotencyKey: key,
      nodeId: 'interview-pattern',
      text: 'Customer tows a caravan in summer.',
    });
    expect(a.status).toBe(201);
    expect(b.body.id).toBe(a.body.id);
    const kase = await tech.get(`/api/cases/${caseId}`);
    expect(kase.body.notes).toHaveLength(1);
    expect(kase.body.notes[0]).toMatchObject({
      nodeId: 'interview-pattern',
      author: { name: expect.any(String) },
    });
  });
});

describe('required evidence', () => {
  const toPumpRemoval = stuckShroudPath.slice(
    0,
    stuckShroudPath.findIndex((s) => s.nodeId === 'pump-removal'),
  );
  const done = { type: 'answer.procedure' as const, result: 'done' as const };
  const photoNeeded =
    'This step needs a photo first: Photos of the pump, impeller side. Add it, then answer.';

  it('refuses an answer at a step that requires a photo until the step has one; a step back goes through', async () => {
    const { tech, caseId } = await openCase();
    const there = await walkSteps(tech, caseId, toPumpRemoval);
    expect(there.walk.currentNode.id).toBe('pump-removal');
    let position = there.walk.position;
    const refused = await answer(tech, caseId, { nodeId: 'pump-removal', answer: done }, position);
    expect(refused.status).toBe(422);
    expect(refused.body.error).toMatchObject({
      code: 'validation_failed',
      reason: 'evidence-required',
      message: photoNeeded,
    });
    const couldNot = await answer(
      tech,
      caseId,
      { nodeId: 'pump-removal', answer: { type: 'answer.procedure', result: 'could-not-do' } },
      position,
    );
    expect(couldNot.status).toBe(422);
    // A photo of another step, or a log on this one, is not the photo this step asks for.
    await tech
      .post(`/api/cases/${caseId}/attachments`)
      .field('nodeId', 'pump-actuation-test')
      .attach('file', await evidencePhoto(), 'scan-tool.jpg')
      .expect(201);
    await tech
      .post(`/api/cases/${caseId}/attachments`)
      .field('nodeId', 'pump-removal')
      .attach('file', evidenceLog(), 'notes.csv')
      .expect(201);
    expect(
      (await answer(tech, caseId, { nodeId: 'pump-removal', answer: done }, position)).status,
    ).toBe(422);

    const back = await tech.post(`/api/cases/${caseId}/walk`).send({
      idempotencyKey: randomUUID(),
      event: { type: 'walk.back', nodeId: 'pump-removal', position },
    });
    expect(back.status, back.text).toBe(201);
    const again = await answer(tech, caseId, toPumpRemoval.at(-1)!, back.body.walk.position);
    expect(again.status, again.text).toBe(201);
    position = again.body.walk.position;

    await attachRequiredEvidence(tech, caseId, again.body.walk.currentNode);
    const answered = await answer(tech, caseId, { nodeId: 'pump-removal', answer: done }, position);
    expect(answered.status, answered.text).toBe(201);
    expect(answered.body.walk.currentNodeId).toBe('shroud-inspection');
  });

  it('refuses an answer at a step that requires a log until a log is attached on it', async () => {
    const { tech, caseId } = await openCase('slow-warm-up-little-heat');
    const there = await walkSteps(tech, caseId, [
      {
        nodeId: 'interview-recent-work',
        answer: { type: 'answer.choice', choiceId: 'no-recent-work' },
      },
      {
        nodeId: 'level-cold',
        answer: {
          type: 'answer.measurement',
          readings: { topUpLitres: { value: 0.2, unit: 'L' } },
        },
      },
      {
        nodeId: 'cold-sensor-check',
        answer: {
          type: 'answer.measurement',
          readings: {
            keyOnLiveTemp: { value: 15, unit: 'degC' },
            standingAirTemp: { value: 14, unit: 'degC' },
          },
        },
      },
    ]);
    expect(there.walk.currentNode.id).toBe('warm-up-log');
    const warmUp = {
      nodeId: 'warm-up-log',
      answer: {
        type: 'answer.measurement' as const,
        readings: {
          minutesTo80: { value: 12, unit: 'min' },
          settledTemp: { value: 90, unit: 'degC' },
          ambientTemp: { value: 14, unit: 'degC' },
        },
      },
    };
    const refused = await answer(tech, caseId, warmUp, there.walk.position);
    expect(refused.status).toBe(422);
    expect(refused.body.error.message).toBe(
      'This step needs a log first: Warm-up log. Add it, then answer.',
    );
    await tech
      .post(`/api/cases/${caseId}/attachments`)
      .field('nodeId', 'warm-up-log')
      .attach('file', evidenceLog(), 'warm-up.csv')
      .expect(201);
    const answered = await answer(tech, caseId, warmUp, there.walk.position);
    expect(answered.status, answered.text).toBe(201);
  });

  it('refuses "Mark diagnosed" while a step on the walk lacks its required photo', async () => {
    const { tech, caseId } = await openCase();
    await walkSteps(tech, caseId, stuckShroudPath);
    // As on a case walked before photos were required: the pump photo is not there.
    await Attachment.destroy({ where: { caseId, nodeId: 'pump-removal' } });
    const refused = await tech.post(`/api/cases/${caseId}/diagnosed`);
    expect(refused.status).toBe(422);
    expect(refused.body.error).toMatchObject({
      code: 'validation_failed',
      reason: 'evidence-required',
      message:
        'The step “Remove the coolant pump for inspection” needs a photo first: Photos of the pump, impeller side. Add it, then mark the case diagnosed.',
    });
    expect((await tech.get(`/api/cases/${caseId}`)).body.status).toBe('in_diagnosis');
    await tech
      .post(`/api/cases/${caseId}/attachments`)
      .field('nodeId', 'pump-removal')
      .attach('file', await evidencePhoto(), 'impeller-side.jpg')
      .expect(201);
    const diagnosed = await tech.post(`/api/cases/${caseId}/diagnosed`);
    expect(diagnosed.status, diagnosed.text).toBe(200);
    expect(diagnosed.body.status).toBe('diagnosed');
  });
});
