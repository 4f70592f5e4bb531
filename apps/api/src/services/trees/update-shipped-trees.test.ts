// Moving a workshop to the trees Heatpath ships now: a tree still on an earlier shipped version
// gets the current definition as a new published version, cases pinned to the old version keep
// reading it, a lead's own edits are left alone, a draft in progress keeps its place after the
// new version, and running it again changes nothing.
import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { contentFingerprintOf } from '@heatpath/fault-tree';
import type { TreeDefinition } from '@heatpath/fault-tree';
import { findShippedTree } from '@heatpath/fault-tree/trees';
import { shippedHistory } from '@heatpath/fault-tree/trees/history';
import { Tree, TreeVersion } from '../../db/models/index';
import { signedIn, testApp, testSequelize } from '../../test/context';
import { createVehicle, createWorkshop, testPassword } from '../../test/factories';
import { updateShippedTrees } from './update-shipped-trees';

const app = testApp();
const treeKey = 'overheats-intermittent-no-codes';

function earlierDefinition(): TreeDefinition {
  const earlier = shippedHistory[treeKey]?.earlier[0];
  if (!earlier) throw new Error('No earlier shipped definition of the overheating tree.');
  return earlier;
}

/** A workshop as it stood before this release: only version 1 of the overheating tree. */
async function workshopOnVersionOne(definition: unknown = earlierDefinition()) {
  const w = await createWorkshop();
  const tree = await Tree.create({
    workshopId: w.workshop.id,
    key: treeKey,
    title: 'Overheats now and then, no fault codes stored',
    symptom: 'The temperature climbs from time to time.',
  });
  await TreeVersion.create({
    treeId: tree.id,
    workshopId: w.workshop.id,
    version: 1,
    status: 'published',
    definition,
    changeNote: 'Shipped with Heatpath.',
    createdBy: w.people.lead.id,
    publishedBy: w.people.lead.id,
    publishedAt: new Date(),
  });
  return { ...w, treeId: tree.id };
}

const run = (workshopId: string) =>
  updateShippedTrees({ sequelize: testSequelize(), workshopIds: [workshopId] });

async function versionsOf(treeId: string) {
  return TreeVersion.findAll({ where: { treeId }, order: [['version', 'ASC']] });
}

describe('updating the shipped trees in a workshop', () => {
  it('publishes the current definition as version 2; a case pinned to version 1 keeps it', async () => {
    const w = await workshopOnVersionOne();
    const tech = await signedIn(app, w.people.technician.email, testPassword);
    const vehicle = await createVehicle(w.workshop.id);
    const before = await tech
      .post('/api/cases')
      .send({ vehicleId: vehicle.id, complaint: 'Runs hot in traffic', treeId: w.treeId });
    expect(before.status).toBe(201);
    const firstStep = earlierDefinition().start;

    const changes = await run(w.workshop.id);
    expect(changes).toEqual(
      expect.arrayContaining([
        { workshopId: w.workshop.id, treeKey, change: 'updated', version: 2 },
        // The workshop never had the other shipped trees: they are installed.
        { workshopId: w.workshop.id, treeKey: 'slow-warm-up-little-heat', change: 'installed' },
      ]),
    );
    const versions = await versionsOf(w.treeId);
    expect(versions.map((v) => [v.version, v.status])).toEqual([
      [1, 'published'],
      [2, 'published'],
    ]);
    const shipped = findShippedTree(treeKey);
    expect(contentFingerprintOf(versions[1]!.definition)).toBe(contentFingerprintOf(shipped));
    expect(versions[1]!.changeNote).toMatch(/^Updated by Heatpath/);
    expect(versions[1]!.basedOnVersion).toBe(1);

    // The old case still reads version 1 and walks on it.
    const old = await tech.get(`/api/cases/${before.body.id}`);
    expect(old.body.tree).toMatchObject({ version: 1 });
    expect(old.body.walk.currentNodeId).toBe(firstStep);
    // A new case starts on version 2.
    const after = await tech
      .post('/api/cases')
      .send({ vehicleId: vehicle.id, complaint: 'Runs hot on the motorway', treeId: w.treeId });
    expect(after.status).toBe(201);
    const fresh = await tech.get(`/api/cases/${after.body.id}`);
    expect(fresh.body.tree).toMatchObject({ version: 2 });

    // Nothing more to do the second time.
    expect(await run(w.workshop.id)).toEqual([]);
    expect(await versionsOf(w.treeId)).toHaveLength(2);
  });

  it('leaves a tree the lead edited and published as the lead made it', async () => {
    const edited = {
      ...earlierDefinition(),
      title: `Our overheating checks ${randomUUID().slice(0, 4)}`,
    };
    const w = await workshopOnVersionOne(edited);
    const changes = await run(w.workshop.id);
    expect(changes).toContainEqual({
      workshopId: w.workshop.id,
      treeKey,
      change: 'kept-lead-edits',
    });
    expect(await versionsOf(w.treeId)).toHaveLength(1);
  });

  it('publishes before a draft in progress, which moves one version up with its content', async () => {
    const w = await workshopOnVersionOne();
    const draftDefinition = { ...earlierDefinition(), title: 'Draft in progress' };
    await TreeVersion.create({
      treeId: w.treeId,
      workshopId: w.workshop.id,
      version: 2,
      status: 'draft',
      definition: draftDefinition,
      basedOnVersion: 1,
      createdBy: w.people.lead.id,
      publishedBy: null,
      publishedAt: null,
      changeNote: null,
    });
    await run(w.workshop.id);
    const versions = await versionsOf(w.treeId);
    expect(versions.map((v) => [v.version, v.status])).toEqual([
      [1, 'published'],
      [2, 'published'],
      [3, 'draft'],
    ]);
    expect((versions[2]!.definition as { title: string }).title).toBe('Draft in progress');
  });
});
