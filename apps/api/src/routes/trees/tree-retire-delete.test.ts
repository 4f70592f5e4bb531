// Retiring a version is one change however many times it is asked for at once (the version row
// is locked), and a tree that was never published can be deleted by the lead and is not offered
// to technicians as something a case could start from.
import { describe, expect, it } from 'vitest';
import { Tree, TreeVersion } from '../../db/models/index';
import { signedIn, testApp } from '../../test/context';
import { createWorkshopWithTrees, testPassword } from '../../test/factories';
import { overheatingTreeKey } from '../../test/walks';

const app = testApp();

async function setup() {
  const w = await createWorkshopWithTrees();
  const lead = await signedIn(app, w.people.lead.email, testPassword);
  const tech = await signedIn(app, w.people.technician.email, testPassword);
  return { w, lead, tech };
}

describe('retiring a version', () => {
  it('lets exactly one of eight concurrent retires succeed; the rest get 409', async () => {
    const { w, lead } = await setup();
    const treeId = w.trees[overheatingTreeKey]!;
    const version = await TreeVersion.findOne({ where: { treeId, status: 'published' } });
    const url = `/api/trees/${treeId}/versions/${version!.id}/retire`;
    const results = await Promise.all(Array.from({ length: 8 }, () => lead.post(url)));
    const statuses = results.map((r) => r.status).sort();
    expect(statuses).toEqual([200, 409, 409, 409, 409, 409, 409, 409]);
    const refused = results.find((r) => r.status === 409)!;
    expect(refused.body.error.message).toMatch(/already retired/);
    await version!.reload();
    expect(version!.status).toBe('retired');
  });
});

describe('a tree that was never published', () => {
  it('is hidden from technicians, offered to the lead as unpublished, and deleted by the lead', async () => {
    const { w, lead, tech } = await setup();
    const created = await lead
      .post('/api/trees')
      .send({ mode: 'blank', title: 'Fan runs on after stop', symptom: 'Fan keeps running' });
    expect(created.status, created.text).toBe(201);
    const treeId = created.body.treeId as string;

    const techList = await tech.get('/api/trees/available');
    expect(techList.body.trees.map((t: { id: string }) => t.id)).not.toContain(treeId);
    expect(techList.body.trees.length).toBeGreaterThan(0);
    const leadList = await lead.get('/api/trees/available');
    expect(leadList.body.trees.find((t: { id: string }) => t.id === treeId)).toMatchObject({
      latestPublished: null,
    });

    expect((await tech.delete(`/api/trees/${treeId}`)).status).toBe(403);
    const deleted = await lead.delete(`/api/trees/${treeId}`);
    expect(deleted.status, deleted.text).toBe(204);
    expect(await Tree.findByPk(treeId)).toBeNull();
    expect(await TreeVersion.count({ where: { treeId } })).toBe(0);
    expect((await lead.get(`/api/trees/${treeId}`)).status).toBe(404);
    expect((await lead.delete(`/api/trees/${treeId}`)).status).toBe(404);

    // A published tree stays, with a reason.
    const published = await lead.delete(`/api/trees/${w.trees[overheatingTreeKey]}`);
    expect(published.status).toBe(409);
    expect(published.body.error.message).toMatch(/has been published/);
  });

  it('is another workshop’s business: their lead gets 404 and the tree stays', async () => {
    const { lead } = await setup();
    const created = await lead
      .post('/api/trees')
      .send({ mode: 'blank', title: 'Heater blows cold', symptom: 'No cabin heat' });
    const other = await setup();
    const res = await other.lead.delete(`/api/trees/${created.body.treeId}`);
    expect(res.status).toBe(404);
    expect(await Tree.findByPk(created.body.treeId as string)).not.toBeNull();
  });
});
