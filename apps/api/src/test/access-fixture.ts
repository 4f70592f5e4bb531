// One workshop with something behind every route: a finished case marked for training with a
// course, an attempt and photos, an open case with a stored and a half-mapped temperature log,
// a repair order sent by e-mail, a staff member, a vehicle and the shipped trees (one of them with
// a draft). Used by the route × role matrix and the fuzzing of every route.
import { expect } from 'vitest';
import supertest from 'supertest';
import { roles } from '@heatpath/contracts';
import type { Role } from '@heatpath/contracts';
import { logCsv, syntheticLog } from '@heatpath/temperature-log/testing';
import { Tree } from '../db/models/index';
import { clientHeaders, signedIn } from './context';
import type { testApp } from './context';
import { createVehicle, createWorkshopWithTrees, testPassword } from './factories';
import type { Agent } from './repair-orders';
import { approveLatest } from './repair-orders';
import { finishedPersonalCase, markForTraining } from './training';
import { overheatingTreeKey } from './walks';

/** The people in the matrix: nobody, the four roles, and the lead of another workshop. */
export const actors = [
  'anonymous',
  'technician',
  'lead',
  'apprentice',
  'advisor',
  'other',
] as const;
export type ActorName = (typeof actors)[number];

export interface AccessFixture {
  workshopId: string;
  /** A diagnosed, approved, sent and training-marked case. */
  caseId: string;
  /** A case still being walked, with temperature logs. */
  openCaseId: string;
  vehicleId: string;
  userId: string;
  apprenticeId: string;
  attachmentId: string;
  trainingCaseId: string;
  courseId: string;
  attemptId: string;
  photoPath: string;
  logId: string;
  pendingUploadId: string;
  messageId: string;
  messageAttachmentId: string;
  approvedRevision: number;
  findingsRevision: number;
  treeId: string;
  versionId: string;
  /** A second shipped tree with a draft open, for the draft routes. */
  draftTreeId: string;
  draftRevision: number;
  draftVersionId: string;
  draftDefinition: unknown;
  /** A third shipped tree whose published version the lead retires. */
  retireTreeId: string;
  retireVersionId: string;
  /** A blank tree never published, which the lead may delete. */
  unpublishedTreeId: string;
  /** Every id of this workshop's records: none may appear in another workshop's answers. */
  ids: string[];
  agents: Record<Role | 'other', Agent>;
  app: ReturnType<typeof testApp>;
}

/** A person who is not signed in, sending Heatpath's client header. */
export const anonymousAgent = (app: ReturnType<typeof testApp>) =>
  supertest.agent(app).set(clientHeaders);

export async function accessFixture(app: ReturnType<typeof testApp>): Promise<AccessFixture> {
  const made = await finishedPersonalCase(app);
  const { w, lead, tech, apprentice } = made;
  const advisor = await signedIn(app, w.people.advisor.email, testPassword);

  // The diagnosed case: approved and sent, so the outbox holds a message with a PDF.
  const approved = await approveLatest(advisor, made.caseId);
  const approvedRevision = approved.current.revision as number;
  const sent = await advisor.post(`/api/cases/${made.caseId}/findings/send`).send({
    revision: approvedRevision,
    to: { address: 'owner@example.test' },
    audience: 'customer',
  });
  expect(sent.status, sent.text).toBe(201);
  const outbox = await lead.get('/api/outbox');
  const message = outbox.body.messages[0];

  const trainingCaseId = await markForTraining(lead, made.caseId);
  const course = await lead.post('/api/training/courses').send({
    title: 'Matrix course',
    apprenticeId: null,
    trainingCaseIds: [trainingCaseId],
  });
  expect(course.status, course.text).toBe(201);
  const attempt = await apprentice.post(`/api/training/cases/${trainingCaseId}/attempts`);
  expect(attempt.status, attempt.text).toBe(201);
  const replay = await apprentice.get(`/api/training/cases/${trainingCaseId}/replay`);
  const photo = replay.body.steps.flatMap((s: { photos: { url: string }[] }) => s.photos)[0];

  // An open case on the same tree, with one stored log and one waiting for its columns.
  const vehicle = await createVehicle(w.workshop.id);
  const open = await tech.post('/api/cases').send({
    vehicleId: vehicle.id,
    complaint: 'Gauge climbs in town traffic.',
    treeId: w.trees[overheatingTreeKey],
  });
  expect(open.status, open.text).toBe(201);
  const openCaseId = open.body.id as string;
  const log = (seed: number, header: boolean) =>
    Buffer.from(
      logCsv(
        syntheticLog({
          seed,
          durationSeconds: 600,
          startC: 20,
          closedAsymptoteC: 125,
          timeConstantSeconds: 300,
          openingC: 88,
          noiseK: 0.1,
        }),
        header ? {} : { header: false, unit: 'degF' },
      ),
    );
  const stored = await tech
    .post(`/api/cases/${openCaseId}/logs`)
    .attach('file', log(3, true), 'a.csv');
  expect(stored.status, stored.text).toBe(201);
  const pending = await tech
    .post(`/api/cases/${openCaseId}/logs`)
    .attach('file', log(4, false), 'b.csv');
  expect(pending.status, pending.text).toBe(200);

  const treeId = w.trees[overheatingTreeKey]!;
  const tree = await lead.get(`/api/trees/${treeId}`);
  const versionId = tree.body.latestPublished.id as string;
  const [draftTree, retireTree] = (
    await Tree.findAll({ where: { workshopId: w.workshop.id }, order: [['key', 'ASC']] })
  ).filter((t) => t.id !== treeId);
  if (!draftTree || !retireTree) throw new Error('The matrix needs three shipped trees.');
  const retire = await lead.get(`/api/trees/${retireTree.id}`);
  const blank = await lead
    .post('/api/trees')
    .send({ mode: 'blank', title: 'Never published', symptom: 'Nothing yet' });
  expect(blank.status, blank.text).toBe(201);
  const draft = await lead.post(`/api/trees/${draftTree.id}/draft`).send({});
  expect(draft.status, draft.text).toBe(201);

  const kase = await lead.get(`/api/cases/${made.caseId}`);

  const otherWorkshop = await createWorkshopWithTrees();
  const agents = { lead, technician: tech, apprentice, advisor } as Record<Role | 'other', Agent>;
  for (const role of roles)
    agents[role] ??= await signedIn(app, w.people[role].email, testPassword);
  agents.other = await signedIn(app, otherWorkshop.people.lead.email, testPassword);

  const f: Omit<AccessFixture, 'ids'> = {
    workshopId: w.workshop.id,
    caseId: made.caseId,
    openCaseId,
    vehicleId: vehicle.id,
    userId: w.people.advisor.id,
    apprenticeId: w.people.apprentice.id,
    attachmentId: made.shownPhotoId,
    trainingCaseId,
    courseId: course.body.id as string,
    attemptId: attempt.body.id as string,
    photoPath: photo.url as string,
    logId: stored.body.log.id as string,
    pendingUploadId: pending.body.pendingUploadId as string,
    messageId: message.id as string,
    messageAttachmentId: message.attachments[0].id as string,
    approvedRevision,
    findingsRevision: kase.body.findings.revision as number,
    treeId,
    versionId,
    draftTreeId: draftTree.id,
    draftRevision: draft.body.revision as number,
    draftVersionId: draft.body.id as string,
    draftDefinition: draft.body.definition,
    retireTreeId: retireTree.id,
    unpublishedTreeId: blank.body.treeId as string,
    retireVersionId: retire.body.latestPublished.id as string,
    agents,
    app,
  };
  const ids = [
    ...Object.values(f).filter(
      (v): v is string => typeof v === 'string' && /^[0-9a-f-]{36}$/.test(v),
    ),
    ...roles.map((r) => w.people[r].id),
  ];
  return { ...f, ids: [...new Set(ids)] };
}
