// Intake and the case list: pinning to the latest published version, filters, search, keyset
// pages, roles and isolation — against the real database.
import { describe, expect, it } from 'vitest';
import { TreeVersion } from '../../db/models/index';
import { signedIn, testApp } from '../../test/context';
import { createVehicle, createWorkshopWithTrees, testPassword } from '../../test/factories';
import { overheatingTreeKey } from '../../test/walks';

const app = testApp();

async function setup() {
  const w = await createWorkshopWithTrees();
  const vehicle = await createVehicle(w.workshop.id);
  const tech = await signedIn(app, w.people.technician.email, testPassword);
  return { ...w, vehicle, tech };
}

describe('opening a case', () => {
  it('pins the latest published version and starts at the tree’s first step', async () => {
    const { tech, vehicle, trees, people } = await setup();
    const res = await tech.post('/api/cases').send({
      vehicleId: vehicle.id,
      complaint: 'Gauge climbs on the motorway, then drops back.',
      mileageAtIntake: 120450,
      mileageUnit: 'km',
      treeId: trees[overheatingTreeKey],
    });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      status: 'open',
      reference: expect.stringMatching(/^C-\d{5}$/),
      tree: { version: 1 },
      assignee: { id: people.technician.id },
      walk: { currentNodeId: 'interview-pattern', status: 'in-progress', position: 0 },
      customer: { id: vehicle.customerId },
      can: { walk: true },
    });
  });

  it('numbers cases per workshop and can add a new customer at intake', async () => {
    const { tech, vehicle, trees } = await setup();
    const first = await tech.post('/api/cases').send({
      vehicleId: vehicle.id,
      complaint: 'First complaint',
      treeId: trees[overheatingTreeKey],
    });
    const second = await tech.post('/api/cases').send({
      vehicleId: vehicle.id,
      complaint: 'Second complaint',
      treeId: trees[overheatingTreeKey],
      newCustomer: { name: 'Demelza Rowe', phone: '01632 960999' },
    });
    expect(first.body.number).toBe(1);
    expect(second.body.number).toBe(2);
    expect(second.body.customer.name).toBe('Demelza Rowe');
  });

  it('refuses a tree with no published version, with a sentence saying why', async () => {
    const { tech, vehicle, trees } = await setup();
    await TreeVersion.update(
      { status: 'retired', retiredAt: new Date() },
      { where: { treeId: trees[overheatingTreeKey] } },
    );
    const res = await tech
      .post('/api/cases')
      .send({ vehicleId: vehicle.id, complaint: 'Overheats', treeId: trees[overheatingTreeKey] });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/no published version/);
  });

  it('explains missing fields', async () => {
    const { tech } = await setup();
    const res = await tech.post('/api/cases').send({ complaint: 'x' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(
      expect.arrayContaining(['vehicleId', 'complaint', 'treeId']),
    );
  });

  it('lets only a lead assign a case to someone else', async () => {
    const { tech, vehicle, trees, people } = await setup();
    const res = await tech.post('/api/cases').send({
      vehicleId: vehicle.id,
      complaint: 'Overheats',
      treeId: trees[overheatingTreeKey],
      assignedTo: people.lead.id,
    });
    expect(res.status).toBe(403);
    const lead = await signedIn(app, people.lead.email, testPassword);
    const ok = await lead.post('/api/cases').send({
      vehicleId: vehicle.id,
      complaint: 'Overheats',
      treeId: trees[overheatingTreeKey],
      assignedTo: people.technician.id,
    });
    expect(ok.status).toBe(201);
    expect(ok.body.assignee.id).toBe(people.technician.id);
  });
});

describe('the case list', () => {
  it('filters, searches and pages by keyset without repeats or gaps', async () => {
    const { tech, vehicle, trees, people } = await setup();
    const ids: string[] = [];
    for (let i = 0; i < 7; i += 1) {
      const r = await tech.post('/api/cases').send({
        vehicleId: vehicle.id,
        complaint: `Complaint ${i}`,
        treeId: trees[overheatingTreeKey],
      });
      ids.push(r.body.id);
    }
    const seen: string[] = [];
    let cursor: string | null = null;
    do {
      const page: { body: { cases: { id: string }[]; nextCursor: string | null } } = await tech
        .get('/api/cases')
        .query({ limit: 3, ...(cursor ? { cursor } : {}) });
      seen.push(...page.body.cases.map((c) => c.id));
      cursor = page.body.nextCursor;
    } while (cursor);
    expect(seen).toEqual([...ids].reverse());

    const lead = await signedIn(app, people.lead.email, testPassword);
    const mine = await lead.get('/api/cases').query({ scope: 'mine' });
    expect(mine.body.cases).toEqual([]);
    const byTech = await lead
      .get('/api/cases')
      .query({ technicianId: people.technician.id, limit: 100 });
    expect(byTech.body.cases).toHaveLength(7);
    const byPlate = await lead
      .get('/api/cases')
      .query({ q: vehicle.plate?.slice(1, 5).toLowerCase() });
    expect(byPlate.body.cases.length).toBe(7);
    const byStatus = await lead.get('/api/cases').query({ status: 'diagnosed' });
    expect(byStatus.body.cases).toEqual([]);
    expect((await lead.get('/api/cases').query({ cursor: 'garbage' })).status).toBe(400);
  });

  it('shows nothing of another workshop, and answers 404 for its case', async () => {
    const mine = await setup();
    const theirs = await setup();
    const theirCase = await theirs.tech.post('/api/cases').send({
      vehicleId: theirs.vehicle.id,
      complaint: 'Theirs',
      treeId: theirs.trees[overheatingTreeKey],
    });
    const list = await mine.tech.get('/api/cases').query({ q: theirs.vehicle.plate ?? '' });
    expect(list.body.cases).toEqual([]);
    expect((await mine.tech.get(`/api/cases/${theirCase.body.id}`)).status).toBe(404);
    // Nor can their vehicle or tree be used for a case here.
    const crossVehicle = await mine.tech.post('/api/cases').send({
      vehicleId: theirs.vehicle.id,
      complaint: 'x y z',
      treeId: mine.trees[overheatingTreeKey],
    });
    expect(crossVehicle.status).toBe(404);
    const crossTree = await mine.tech.post('/api/cases').send({
      vehicleId: mine.vehicle.id,
      complaint: 'x y z',
      treeId: theirs.trees[overheatingTreeKey],
    });
    expect(crossTree.status).toBe(404);
  });

  it('keeps apprentices out of live cases', async () => {
    const { vehicle, trees, people, tech } = await setup();
    const kase = await tech
      .post('/api/cases')
      .send({ vehicleId: vehicle.id, complaint: 'Live case', treeId: trees[overheatingTreeKey] });
    const apprentice = await signedIn(app, people.apprentice.email, testPassword);
    expect((await apprentice.get('/api/cases')).status).toBe(403);
    expect((await apprentice.get(`/api/cases/${kase.body.id}`)).status).toBe(403);
  });
});
