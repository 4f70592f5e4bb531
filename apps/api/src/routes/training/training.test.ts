// The training casebook through the API on the real database: personal data never reaches an
// apprentice (every string of every response checked), scoring of a fixed recorded case worked
// by hand, attempts stored and repeatable, and course sign-off recorded.
import { describe, expect, it } from 'vitest';
import { testApp } from '../../test/context';
import { diagnosedCase } from '../../test/repair-orders';
import type { Agent } from '../../test/repair-orders';
import {
  finishedPersonalCase,
  hiddenNoteText,
  markForTraining,
  personal,
  stringsIn,
} from '../../test/training';
import { stuckShroudPath } from '../../test/walks';

const app = testApp();

function keysIn(value: unknown): string[] {
  if (Array.isArray(value)) return value.flatMap(keysIn);
  if (value !== null && typeof value === 'object')
    return Object.entries(value).flatMap(([k, v]) => [k, ...keysIn(v)]);
  return [];
}

interface Attempt {
  id: string;
  status: string;
  score: number;
  maxScore: number;
  current: {
    step: { index: number; next: unknown };
    ask: { kind: string; options: { id: string }[] };
  } | null;
  steps: {
    step: { index: number; routeLabel: string | null };
    prediction: { correct: boolean; points: number } | null;
  }[];
  outcome: { nodeId: string } | null;
}

/**
 * The choices of the fixed run below, by step index of the stuck-shroud walk: "next" steps are
 * answered right (the next node of the recorded path), "meaning" steps wrong (an option other
 * than the branch the readings took, read from the tree by hand), and the root cause right.
 */
const meaningTaken: Record<number, string> = {
  4: 'fallback',
  5: 'fallback',
  7: 'fallback',
  10: 'fallback',
  11: 'branch:0',
};
function fixedChoice(attempt: Attempt): string {
  const current = attempt.current!;
  const index = current.step.index;
  if (current.ask.kind === 'cause') return 'pump-shroud-stuck';
  if (current.ask.kind === 'next') return stuckShroudPath[index + 1]!.nodeId;
  return current.ask.options.find((o) => o.id !== meaningTaken[index])!.id;
}

async function predictThrough(
  apprentice: Agent,
  trainingCaseId: string,
  choose: (attempt: Attempt) => string,
  responses: unknown[] = [],
): Promise<Attempt> {
  const started = await apprentice.post(`/api/training/cases/${trainingCaseId}/attempts`);
  expect(started.status, started.text).toBe(201);
  responses.push(started.body);
  let attempt = started.body as Attempt;
  while (attempt.current) {
    const res = await apprentice
      .post(`/api/training/attempts/${attempt.id}/predictions`)
      .send({ index: attempt.current.step.index, optionId: choose(attempt) });
    expect(res.status, res.text).toBe(200);
    responses.push(res.body);
    attempt = res.body as Attempt;
  }
  return attempt;
}

describe('personal data and the apprentice', () => {
  it('never sends a customer name, contact, plate or VIN — nor hidden notes and photos', async () => {
    const { lead, apprentice, caseId, shownPhotoId, hiddenPhotoId } =
      await finishedPersonalCase(app);
    const trainingCaseId = await markForTraining(lead, caseId, {
      hiddenAttachmentIds: [hiddenPhotoId],
    });

    const responses: unknown[] = [];
    const get = async (path: string) => {
      const res = await apprentice.get(path);
      expect(res.status, `${path}: ${res.text}`).toBe(200);
      responses.push(res.body);
      return res.body;
    };
    const casebook = await get('/api/training/casebook');
    expect(casebook.cases.map((c: { id: string }) => c.id)).toEqual([trainingCaseId]);
    const replay = await get(`/api/training/cases/${trainingCaseId}/replay`);
    const final = await predictThrough(apprentice, trainingCaseId, fixedChoice, responses);
    await get(`/api/training/attempts/${final.id}`);
    await get('/api/training/me/progress');

    const forbidden = [
      personal.name,
      ...personal.name.split(' '),
      personal.phone,
      personal.phone.replace(/\s/g, ''),
      personal.email,
      personal.plate,
      personal.plate.replace(/\s/g, ''),
      personal.vin,
      hiddenPhotoId,
    ].map((s) => s.toLowerCase());
    const strings = responses.flatMap((body) => stringsIn(body));
    expect(strings.length).toBeGreaterThan(200);
    const leaks = strings.filter(({ text }) =>
      forbidden.some((secret) => text.toLowerCase().includes(secret)),
    );
    expect(leaks).toEqual([]);
    // No field that could hold them is sent at all.
    const keys = new Set(responses.flatMap((body) => keysIn(body)));
    for (const key of ['plate', 'vin', 'customer', 'customerName', 'phone', 'email'])
      expect(keys.has(key)).toBe(false);

    // What was redacted is still there in outline, so the story reads.
    expect(replay.trainingCase.complaint).toBe(
      '[hidden] (call [hidden]) says the gauge climbs on hills.',
    );
    const hoseStep = replay.steps.find((s: { nodeId: string }) => s.nodeId === 'hose-temps');
    expect(hoseStep.notes).toEqual(['Hoses read on [hidden]; mail [hidden] the figures.']);
    expect(replay.findings.concern).toBe('[hidden] reports overheating; VIN [hidden].');
    // Readings and computed values come with the step.
    expect(hoseStep.answer.readings.map((r: { display: string }) => r.display)).toEqual([
      '110 °C',
      '52 °C',
      '45 °C',
    ]);
    const shroud = replay.steps.find((s: { nodeId: string }) => s.nodeId === 'shroud-inspection');
    expect(shroud.photos.map((p: { id: string }) => p.id)).toEqual([shownPhotoId]);
    expect((await apprentice.get(shroud.photos[0].url)).status).toBe(200);
    const hiddenUrl = shroud.photos[0].url.replace(shownPhotoId, hiddenPhotoId);
    expect((await apprentice.get(hiddenUrl)).status).toBe(404);
    // The tree the case was walked on is readable too, for the apprentice to study.
    const tree = await apprentice.get(`/api/training/cases/${trainingCaseId}/tree`);
    expect(tree.status).toBe(200);
    expect(tree.body).toMatchObject({
      version: 1,
      definition: { id: 'overheats-intermittent-no-codes' },
    });
    // Cautions are shown at the steps that carry them.
    expect(replay.steps.some((s: { cautions: unknown[] }) => s.cautions.length > 0)).toBe(true);
  });

  it('hides a plate or VIN however the technician spaced or dashed it, and the plate’s parts', async () => {
    // personal.plate is "TR19 WNX"; the VIN is KX1HT84A0JB123457.
    const { lead, apprentice, caseId } = await finishedPersonalCase(app, {
      complaint: 'TR19-WNX (T R 1 9 W N X on the job card) climbs on hills.',
      notes: [
        'VIN KX1 HT8 4A0 JB1 234 57 read off the screen; serial 123457 matches.',
        'Booked in as TR19, the WNX one. Could see steam at the cap.',
        'tr19wnx again, KX1-HT84A0-JB123457 on the invoice.',
      ],
    });
    const trainingCaseId = await markForTraining(lead, caseId);
    const responses: unknown[] = [];
    const get = async (path: string) => {
      const res = await apprentice.get(path);
      expect(res.status, `${path}: ${res.text}`).toBe(200);
      responses.push(res.body);
      return res.body;
    };
    await get('/api/training/casebook');
    const replay = await get(`/api/training/cases/${trainingCaseId}/replay`);
    const final = await predictThrough(apprentice, trainingCaseId, fixedChoice, responses);
    await get(`/api/training/attempts/${final.id}`);

    // Separators and case ignored, as the vehicle search compares them.
    const key = (text: string) => text.replace(/[^\p{L}\p{N}]/gu, '').toUpperCase();
    const strings = responses.flatMap((body) => stringsIn(body));
    const leaks = strings.filter(({ text }) =>
      ['TR19WNX', 'KX1HT84A0JB123457', '123457'].some((secret) => key(text).includes(secret)),
    );
    expect(leaks).toEqual([]);
    const parts = strings.filter(({ text }) => /\bTR19\b|\bWNX\b/i.test(text));
    expect(parts).toEqual([]);

    expect(replay.trainingCase.complaint).toBe(
      '[hidden] ([hidden] on the job card) climbs on hills.',
    );
    const hoseStep = replay.steps.find((s: { nodeId: string }) => s.nodeId === 'hose-temps');
    expect(hoseStep.notes.slice(1)).toEqual([
      'VIN [hidden] read off the screen; serial [hidden] matches.',
      'Booked in as [hidden], the [hidden] one. Could see steam at the cap.',
      '[hidden] again, [hidden] on the invoice.',
    ]);
  });

  it('leaves the technician’s notes out when the lead hides them', async () => {
    const { lead, apprentice, caseId } = await finishedPersonalCase(app);
    const trainingCaseId = await markForTraining(lead, caseId, { hideNotes: true });
    const replay = await apprentice.get(`/api/training/cases/${trainingCaseId}/replay`);
    expect(replay.status).toBe(200);
    const texts = stringsIn(replay.body).map((s) => s.text);
    expect(texts.some((t) => t.includes(hiddenNoteText))).toBe(false);
    expect(replay.body.steps.every((s: { notes: string[] }) => s.notes.length === 0)).toBe(true);
    const unhide = await lead
      .patch(`/api/training/cases/${trainingCaseId}`)
      .send({ hideNotes: false });
    expect(unhide.status).toBe(200);
    const again = await apprentice.get(`/api/training/cases/${trainingCaseId}/replay`);
    expect(stringsIn(again.body).some((s) => s.text === hiddenNoteText)).toBe(true);
  });
});

describe('predicting through a case', () => {
  it('scores a fixed recorded case as worked by hand: 15 of 20', async () => {
    const { lead, apprentice, caseId } = await finishedPersonalCase(app);
    const trainingCaseId = await markForTraining(lead, caseId);
    const attempt = await predictThrough(apprentice, trainingCaseId, fixedChoice);
    // 20 steps: one with one way on (the cold level, not asked), thirteen "next" right (13),
    // five "meaning" wrong (0), the root cause right (2) → 15 of 13 + 5 + 2 = 20.
    expect(attempt).toMatchObject({ status: 'finished', score: 15, maxScore: 20 });
    expect(attempt.steps).toHaveLength(20);
    expect(attempt.steps.filter((s) => s.prediction === null)).toHaveLength(1);
    expect(attempt.steps.map((s) => s.prediction?.points ?? null)).toEqual([
      1,
      null,
      1,
      1,
      0,
      0,
      1,
      0,
      1,
      1,
      0,
      0,
      1,
      1,
      1,
      1,
      1,
      1,
      1,
      2,
    ]);
    expect(attempt.outcome?.nodeId).toBe('pump-shroud-stuck');
    // Each step is revealed once predicted.
    expect(attempt.steps.every((s) => s.step.routeLabel !== null)).toBe(true);

    const progress = await lead.get('/api/training/progress');
    const mine = progress.body.apprentices.find((a: { apprentice: { name: string } }) =>
      a.apprentice.name.startsWith('Test apprentice'),
    );
    expect(mine).toMatchObject({ casesReviewed: 1, attempts: 1, averageScorePercent: 75 });
    // Five meaning steps wrong once each: the three shown are the first three by title.
    expect(mine.weakSpots).toHaveLength(3);
    expect(
      mine.weakSpots.every((s: { wrong: number; asked: number }) => s.wrong === 1 && s.asked === 1),
    ).toBe(true);
  });

  it('hides where a step led until it is predicted, keeps each prediction, and refuses changes', async () => {
    const { lead, apprentice, caseId } = await finishedPersonalCase(app);
    const trainingCaseId = await markForTraining(lead, caseId);
    const started = await apprentice.post(`/api/training/cases/${trainingCaseId}/attempts`);
    const attempt = started.body as Attempt;
    // The first question is asked: a fault that began after cooling work goes to bleeding first.
    expect(attempt.current?.step.index).toBe(0);
    expect(attempt.current?.step.next).toBeNull();
    expect(JSON.stringify(attempt)).not.toContain('pump-shroud-stuck');

    const send = (index: number, optionId: string) =>
      apprentice.post(`/api/training/attempts/${attempt.id}/predictions`).send({ index, optionId });
    const opening = await send(0, 'level-cold');
    expect(opening.status).toBe(200);
    expect(opening.body.steps[0].prediction).toMatchObject({ correct: true, points: 1 });
    // The cold level has one way on and is not asked: the next question is the look for leaks.
    expect(opening.body.current.step.index).toBe(2);
    expect(opening.body.steps[1].prediction).toBeNull();
    expect((await send(2, 'no-such-option')).status).toBe(400);
    expect((await send(3, 'concentration-eg')).status).toBe(409);
    const first = await send(2, 'locate-visible-leak');
    expect(first.status).toBe(200);
    expect(first.body.steps[2].prediction).toMatchObject({
      chosenId: 'locate-visible-leak',
      correctId: 'glycol-type',
      correct: false,
      points: 0,
    });
    // The same prediction again (a retry) is answered the same; a different one is refused.
    const retry = await send(2, 'locate-visible-leak');
    expect(retry.status).toBe(200);
    expect(retry.body.current.step.index).toBe(3);
    const changed = await send(2, 'glycol-type');
    expect(changed.status).toBe(409);
    expect(changed.body.error.message).toMatch(/already answered/);

    // Stored: a fresh read shows the same.
    const reread = await apprentice.get(`/api/training/attempts/${attempt.id}`);
    expect(reread.body.steps[2].prediction.chosenId).toBe('locate-visible-leak');
    expect(reread.body.score).toBe(1);

    // A second attempt, done well, is the best score; both are counted.
    const perfect = await predictThrough(apprentice, trainingCaseId, (a) => {
      const c = a.current!;
      if (c.ask.kind === 'cause') return 'pump-shroud-stuck';
      if (c.ask.kind === 'next') return stuckShroudPath[c.step.index + 1]!.nodeId;
      return meaningTaken[c.step.index]!;
    });
    expect(perfect).toMatchObject({ score: 20, maxScore: 20 });
    expect(
      (
        await apprentice
          .post(`/api/training/attempts/${perfect.id}/predictions`)
          .send({ index: 19, optionId: 'no-cause-found' })
      ).status,
    ).toBe(409);
    const casebook = await apprentice.get('/api/training/casebook');
    expect(casebook.body.cases[0]).toMatchObject({
      attempts: 2,
      bestScore: { score: 20, maxScore: 20 },
    });
  });
});

describe('the lead’s casebook', () => {
  it('marks only finished cases, once, with photos of that case', async () => {
    const { lead, caseId, w, hiddenPhotoId } = await finishedPersonalCase(app);
    const candidates = await lead.get('/api/training/candidates');
    expect(candidates.status).toBe(200);
    expect(candidates.body.cases.map((c: { caseId: string }) => c.caseId)).toEqual([caseId]);
    // The two shroud photos and the two the walk required (test fluid, pump).
    expect(candidates.body.cases[0].photos).toHaveLength(4);

    const open = await lead.post('/api/cases').send({
      vehicleId: (await lead.get(`/api/cases/${caseId}`)).body.vehicle.id,
      complaint: 'Another visit, not finished',
      treeId: w.trees['overheats-intermittent-no-codes'],
    });
    expect(open.status).toBe(201);
    const notFinished = await lead.post('/api/training/cases').send({
      caseId: open.body.id,
      teachingNote: 'Not yet',
      difficulty: 'starter',
    });
    expect(notFinished.status).toBe(409);
    expect(notFinished.body.error.message).toMatch(/not finished/);

    const other = await diagnosedCase(app);
    const foreignPhoto = await lead.post('/api/training/cases').send({
      caseId,
      teachingNote: 'Hide a photo of another case',
      difficulty: 'starter',
      hiddenAttachmentIds: [other.photoId],
    });
    expect(foreignPhoto.status).toBe(400);
    const foreignCase = await lead.post('/api/training/cases').send({
      caseId: other.caseId,
      teachingNote: 'Another workshop’s case',
      difficulty: 'starter',
    });
    expect(foreignCase.status).toBe(404);

    const bad = await lead.post('/api/training/cases').send({ caseId, difficulty: 'expert' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).not.toMatch(/zod|SELECT|at .*\.ts/);

    await markForTraining(lead, caseId, { hiddenAttachmentIds: [hiddenPhotoId] });
    const twice = await lead.post('/api/training/cases').send({
      caseId,
      teachingNote: 'Again',
      difficulty: 'starter',
    });
    expect(twice.status).toBe(409);
    expect((await lead.get('/api/training/candidates')).body.cases).toEqual([]);
    const list = await lead.get('/api/training/cases');
    expect(list.body.trainingCases[0]).toMatchObject({
      caseId,
      difficulty: 'practised',
      hiddenAttachmentIds: [hiddenPhotoId],
      outcomeTitle: expect.stringMatching(/shroud/i),
      attempts: 0,
      withdrawn: false,
    });
  });

  it('withdraws a case from the casebook and keeps its attempts', async () => {
    const { lead, apprentice, caseId } = await finishedPersonalCase(app);
    const id = await markForTraining(lead, caseId);
    await predictThrough(apprentice, id, fixedChoice);
    expect((await lead.patch(`/api/training/cases/${id}`).send({ withdrawn: true })).status).toBe(
      200,
    );
    expect((await apprentice.get('/api/training/casebook')).body.cases).toEqual([]);
    expect((await apprentice.get(`/api/training/cases/${id}/replay`)).status).toBe(404);
    expect((await apprentice.post(`/api/training/cases/${id}/attempts`)).status).toBe(404);
    const list = await lead.get('/api/training/cases');
    expect(list.body.trainingCases[0]).toMatchObject({ withdrawn: true, attempts: 1 });
    expect((await lead.patch(`/api/training/cases/${id}`).send({})).status).toBe(400);
  });

  it('builds an ordered course, shows progress, and records a sign-off once', async () => {
    const { lead, apprentice, caseId, w } = await finishedPersonalCase(app);
    const id = await markForTraining(lead, caseId);
    const bad = await lead
      .post('/api/training/courses')
      .send({ title: 'Hot running', apprenticeId: null, trainingCaseIds: [] });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.trainingCaseIds).toMatch(/at least one/);
    const notApprentice = await lead.post('/api/training/courses').send({
      title: 'Hot running',
      apprenticeId: w.people.technician.id,
      trainingCaseIds: [id],
    });
    expect(notApprentice.status).toBe(400);
    const created = await lead.post('/api/training/courses').send({
      title: 'Hot running, first steps',
      description: 'Cases where the engine overheats now and then.',
      apprenticeId: null,
      trainingCaseIds: [id],
    });
    expect(created.status, created.text).toBe(201);
    const courseId = created.body.id as string;
    expect(created.body.items).toEqual([
      { trainingCaseId: id, symptom: expect.any(String), difficulty: 'practised' },
    ]);

    let progress = (await lead.get(`/api/training/progress/${w.people.apprentice.id}`)).body;
    expect(progress.courses).toEqual([
      expect.objectContaining({ id: courseId, completedCases: 0, totalCases: 1, signOff: null }),
    ]);
    await predictThrough(apprentice, id, fixedChoice);
    progress = (await lead.get(`/api/training/progress/${w.people.apprentice.id}`)).body;
    expect(progress.courses[0]).toMatchObject({ completedCases: 1, totalCases: 1 });
    expect(progress.history).toEqual([
      expect.objectContaining({ trainingCaseId: id, status: 'finished', score: 15, maxScore: 20 }),
    ]);

    const signed = await lead
      .post(`/api/training/courses/${courseId}/sign-offs`)
      .send({ apprenticeId: w.people.apprentice.id, note: 'Reads hose temperatures well.' });
    expect(signed.status, signed.text).toBe(201);
    expect(signed.body).toMatchObject({
      signedBy: { id: w.people.lead.id, name: w.people.lead.name },
      note: 'Reads hose temperatures well.',
    });
    expect(Date.now() - Date.parse(signed.body.signedAt)).toBeLessThan(60_000);
    const again = await lead
      .post(`/api/training/courses/${courseId}/sign-offs`)
      .send({ apprenticeId: w.people.apprentice.id });
    expect(again.status).toBe(409);
    expect(again.body.error.message).toMatch(/already signed off/);
    const techSign = await lead
      .post(`/api/training/courses/${courseId}/sign-offs`)
      .send({ apprenticeId: w.people.technician.id });
    expect(techSign.status).toBe(400);

    progress = (await lead.get(`/api/training/progress/${w.people.apprentice.id}`)).body;
    expect(progress.courses[0].signOff).toMatchObject({ signedBy: { name: w.people.lead.name } });
    const casebook = (await apprentice.get('/api/training/casebook')).body;
    expect(casebook.courses[0]).toMatchObject({
      id: courseId,
      forEveryone: true,
      trainingCaseIds: [id],
      signOff: { note: 'Reads hose temperatures well.' },
    });

    // Reordering replaces the list; the course keeps its id.
    const renamed = await lead.put(`/api/training/courses/${courseId}`).send({
      title: 'Hot running',
      apprenticeId: w.people.apprentice.id,
      trainingCaseIds: [id],
    });
    expect(renamed.status).toBe(200);
    expect(renamed.body.apprentice).toEqual({
      id: w.people.apprentice.id,
      name: w.people.apprentice.name,
    });
  });
});
