// A diagnosed case for repair-order tests: a fresh workshop, the stuck-shroud walk through the
// API as the technician (with the photo the pump removal requires), a photo of the shroud, and
// "diagnosed". Also small helpers to save and
// approve findings the way the screens do.
import sharp from 'sharp';
import { expect } from 'vitest';
import { signedIn } from './context';
import type { testApp } from './context';
import { createVehicle, createWorkshopWithTrees, testPassword } from './factories';
import { overheatingTreeKey, stuckShroudPath, walkSteps } from './walks';

export type Agent = Awaited<ReturnType<typeof signedIn>>;

/** A small invented photo: a grey square with a teal band, as a PNG. */
export async function testPhoto(): Promise<Buffer> {
  return sharp({
    create: { width: 320, height: 240, channels: 3, background: { r: 120, g: 124, b: 128 } },
  })
    .composite([
      {
        input: await sharp({
          create: { width: 320, height: 60, channels: 3, background: { r: 11, g: 90, b: 81 } },
        })
          .png()
          .toBuffer(),
        top: 90,
        left: 0,
      },
    ])
    .png()
    .toBuffer();
}

export async function walkToOutcome(agent: Agent, caseId: string): Promise<void> {
  await walkSteps(agent, caseId, stuckShroudPath);
}

export async function diagnosedCase(
  app: ReturnType<typeof testApp>,
  options: { photo?: boolean } = {},
) {
  const w = await createWorkshopWithTrees();
  const vehicle = await createVehicle(w.workshop.id);
  const tech = await signedIn(app, w.people.technician.email, testPassword);
  const created = await tech.post('/api/cases').send({
    vehicleId: vehicle.id,
    complaint: 'Temperature gauge climbs on long motorway climbs.',
    mileageAtIntake: 118400,
    treeId: w.trees[overheatingTreeKey],
  });
  expect(created.status, created.text).toBe(201);
  const caseId = created.body.id as string;
  await walkToOutcome(tech, caseId);
  let photoId: string | null = null;
  if (options.photo !== false) {
    const upload = await tech
      .post(`/api/cases/${caseId}/attachments`)
      .field('nodeId', 'shroud-inspection')
      .attach('file', await testPhoto(), {
        filename: 'shroud-stuck.png',
        contentType: 'image/png',
      });
    expect(upload.status, upload.text).toBe(201);
    photoId = upload.body.id as string;
  }
  const diagnosed = await tech.post(`/api/cases/${caseId}/diagnosed`);
  expect(diagnosed.status, diagnosed.text).toBe(200);
  const advisor = await signedIn(app, w.people.advisor.email, testPassword);
  const lead = await signedIn(app, w.people.lead.email, testPassword);
  return {
    w,
    vehicle,
    caseId,
    photoId,
    tech,
    advisor,
    lead,
    reference: created.body.reference as string,
  };
}

/** The findings as a save request, from the review's current revision. */
export function editOf(current: {
  revision: number;
  concern: string;
  cause: string;
  correction: string;
  parts: unknown[];
  labour: unknown[];
  followUps: string[];
  photoIds: string[];
}) {
  return {
    revision: current.revision,
    concern: current.concern,
    cause: current.cause,
    correction: current.correction,
    parts: current.parts,
    labour: current.labour,
    followUps: current.followUps,
    photoIds: current.photoIds,
  };
}

/** Reviews, optionally changes, saves and approves; returns the approved review. */
export async function approveLatest(agent: Agent, caseId: string) {
  const review = await agent.get(`/api/cases/${caseId}/findings/review`);
  expect(review.status, review.text).toBe(200);
  const approved = await agent
    .post(`/api/cases/${caseId}/findings/approve`)
    .send({ revision: review.body.current.revision });
  expect(approved.status, approved.text).toBe(200);
  return approved.body;
}
