// An idempotency key names one request. Sent again with the same answer it is a retry and gets
// the stored result (200, repeated); sent with a different answer, or a note's key reused for an
// answer, it is refused with 409 and the first answer stays — nothing is silently dropped.
import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { CaseEvent } from '../../db/models/index';
import { signedIn, testApp } from '../../test/context';
import { createVehicle, createWorkshopWithTrees, testPassword } from '../../test/factories';
import { overheatingTreeKey, stuckShroudPath } from '../../test/walks';

const app = testApp();

async function walkedOneStep() {
  const w = await createWorkshopWithTrees();
  const vehicle = await createVehicle(w.workshop.id);
  const tech = await signedIn(app, w.people.technician.email, testPassword);
  const created = await tech.post('/api/cases').send({
    vehicleId: vehicle.id,
    complaint: 'Gauge climbs on hills.',
    treeId: w.trees[overheatingTreeKey],
  });
  expect(created.status, created.text).toBe(201);
  const caseId = created.body.id as string;
  const first = stuckShroudPath[0]!;
  const res = await tech.post(`/api/cases/${caseId}/walk`).send({
    idempotencyKey: randomUUID(),
    event: { ...first.answer, nodeId: first.nodeId, position: 0 },
  });
  expect(res.status, res.text).toBe(201);
  return { tech, caseId, position: res.body.walk.position as number };
}

describe('idempotency keys', () => {
  it('repeats an answer sent again as it was, and refuses the key with a different answer', async () => {
    const { tech, caseId, position } = await walkedOneStep();
    const key = randomUUID();
    const level = (litres: number) => ({
      idempotencyKey: key,
      event: {
        type: 'answer.measurement',
        nodeId: 'level-cold',
        position,
        readings: { topUpLitres: { value: litres, unit: 'L' } },
      },
    });
    const first = await tech.post(`/api/cases/${caseId}/walk`).send(level(0.2));
    expect(first.status, first.text).toBe(201);

    // The same answer with its keys in another order is the same request.
    const retry = await tech.post(`/api/cases/${caseId}/walk`).send({
      event: {
        readings: { topUpLitres: { unit: 'L', value: 0.2 } },
        position,
        nodeId: 'level-cold',
        type: 'answer.measurement',
      },
      idempotencyKey: key,
    });
    expect(retry.status, retry.text).toBe(200);
    expect(retry.body.repeated).toBe(true);

    const different = await tech.post(`/api/cases/${caseId}/walk`).send(level(0.9));
    expect(different.status, different.text).toBe(409);
    expect(different.body.error).toMatchObject({ code: 'conflict' });
    expect(different.body.error.message).toMatch(/different answer/);

    const events = await CaseEvent.findAll({ where: { caseId }, order: [['seq', 'ASC']] });
    expect(events).toHaveLength(2);
    const stored = events[1]!.payload as {
      event: { readings: { topUpLitres: { value: number } } };
    };
    expect(stored.event.readings.topUpLitres.value).toBe(0.2);
  });

  it('refuses a note key reused for other text, or for an answer', async () => {
    const { tech, caseId, position } = await walkedOneStep();
    const key = randomUUID();
    const note = (text: string) =>
      tech.post(`/api/cases/${caseId}/notes`).send({ idempotencyKey: key, nodeId: null, text });
    expect((await note('Hose clamp loose at the pump.')).status).toBe(201);
    expect((await note('Hose clamp loose at the pump.')).status).toBe(201);
    const changed = await note('Something else entirely.');
    expect(changed.status, changed.text).toBe(409);
    expect(changed.body.error.message).toMatch(/different note/);

    const answer = await tech.post(`/api/cases/${caseId}/walk`).send({
      idempotencyKey: key,
      event: {
        type: 'answer.measurement',
        nodeId: 'level-cold',
        position,
        readings: { topUpLitres: { value: 0.2, unit: 'L' } },
      },
    });
    expect(answer.status, answer.text).toBe(409);
    const notes = await CaseEvent.findAll({ where: { caseId, kind: 'note' } });
    expect(notes.map((n) => (n.payload as { text: string }).text)).toEqual([
      'Hose clamp loose at the pump.',
    ]);
  });
});
