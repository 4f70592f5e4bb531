// A finished case full of personal data, for training tests: the customer's name, phone and
// e-mail and the vehicle's plate and VIN appear in the records and in free text (complaint, a
// note, the findings), so a test can prove none of it reaches an apprentice.
import { randomUUID } from 'node:crypto';
import { expect } from 'vitest';
import { Customer, Vehicle } from '../db/models/index';
import { signedIn } from './context';
import type { testApp } from './context';
import { createWorkshopWithTrees, testPassword } from './factories';
import { testPhoto, walkToOutcome } from './repair-orders';
import type { Agent } from './repair-orders';
import { overheatingTreeKey } from './walks';

export const personal = {
  name: 'Wenna Treloar',
  phone: '01632 960999',
  email: 'wenna.treloar@example.test',
  plate: 'TR19 WNX',
  vin: 'KX1HT84A0JB123457',
};

export const hiddenNoteText = 'Only for the lead: checked the heater valve on the side.';

/** Free text to write on the case instead of the usual complaint, and extra notes. */
export interface PersonalCaseText {
  complaint?: string;
  notes?: string[];
}

export async function finishedPersonalCase(
  app: ReturnType<typeof testApp>,
  text: PersonalCaseText = {},
) {
  const w = await createWorkshopWithTrees();
  const customer = await Customer.create({
    workshopId: w.workshop.id,
    name: personal.name,
    phone: personal.phone,
    email: personal.email,
  });
  const vehicle = await Vehicle.create({
    workshopId: w.workshop.id,
    customerId: customer.id,
    plate: personal.plate,
    plateKey: personal.plate.replace(/\s/g, ''),
    vin: personal.vin,
    make: 'Halden',
    model: 'Varro',
    year: 2018,
    engine: '1.6 petrol',
    fuel: 'petrol',
    mileage: 88000,
  });
  const tech = await signedIn(app, w.people.technician.email, testPassword);
  const created = await tech.post('/api/cases').send({
    vehicleId: vehicle.id,
    customerId: customer.id,
    complaint:
      text.complaint ?? `${personal.name} (call ${personal.phone}) says the gauge climbs on hills.`,
    mileageAtIntake: 88100,
    treeId: w.trees[overheatingTreeKey],
  });
  expect(created.status, created.text).toBe(201);
  const caseId = created.body.id as string;
  await walkToOutcome(tech, caseId);
  const note = async (nodeId: string | null, text: string) => {
    const res = await tech
      .post(`/api/cases/${caseId}/notes`)
      .send({ idempotencyKey: randomUUID(), nodeId, text });
    expect(res.status, res.text).toBe(201);
  };
  await note('hose-temps', `Hoses read on ${personal.plate}; mail ${personal.email} the figures.`);
  await note('pump-removal', hiddenNoteText);
  for (const extra of text.notes ?? []) await note('hose-temps', extra);
  const upload = async (nodeId: string, filename: string) => {
    const res = await tech
      .post(`/api/cases/${caseId}/attachments`)
      .field('nodeId', nodeId)
      .attach('file', await testPhoto(), { filename, contentType: 'image/png' });
    expect(res.status, res.text).toBe(201);
    return res.body.id as string;
  };
  const shownPhotoId = await upload('shroud-inspection', 'shroud-stuck.png');
  const hiddenPhotoId = await upload('shroud-inspection', `${personal.plate}-front.png`);
  // The findings mention the customer and the VIN, as a technician might write them.
  const findings = await tech.get(`/api/cases/${caseId}`);
  const f = findings.body.findings;
  const saved = await tech.put(`/api/cases/${caseId}/findings`).send({
    revision: f.revision,
    concern: `${personal.name} reports overheating; VIN ${personal.vin}.`,
    cause: f.cause,
    correction: f.correction,
    parts: f.parts,
    labour: f.labour,
    followUps: [...f.followUps, `Ring ${personal.name} on ${personal.phone} when done.`],
  });
  expect(saved.status, saved.text).toBe(200);
  const diagnosed = await tech.post(`/api/cases/${caseId}/diagnosed`);
  expect(diagnosed.status, diagnosed.text).toBe(200);
  const lead = await signedIn(app, w.people.lead.email, testPassword);
  const apprentice = await signedIn(app, w.people.apprentice.email, testPassword);
  return { w, caseId, tech, lead, apprentice, shownPhotoId, hiddenPhotoId };
}

/** Marks the case for training as the lead and returns the training case id. */
export async function markForTraining(
  lead: Agent,
  caseId: string,
  extra: { hideNotes?: boolean; hiddenAttachmentIds?: string[] } = {},
): Promise<string> {
  const res = await lead.post('/api/training/cases').send({
    caseId,
    teachingNote: 'Watch how the hose temperatures point past the thermostat.',
    difficulty: 'practised',
    ...extra,
  });
  expect(res.status, res.text).toBe(201);
  return res.body.id as string;
}

/** Every string anywhere in a JSON value, with the path that leads to it. */
export function stringsIn(value: unknown, path = '$'): { path: string; text: string }[] {
  if (typeof value === 'string') return [{ path, text: value }];
  if (Array.isArray(value)) return value.flatMap((v, i) => stringsIn(v, `${path}[${i}]`));
  if (value !== null && typeof value === 'object')
    return Object.entries(value).flatMap(([k, v]) => stringsIn(v, `${path}.${k}`));
  return [];
}
