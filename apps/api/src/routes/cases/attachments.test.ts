// Uploads: content sniffed (not the name), size and type limits, photo-only steps, thumbnails,
// nothing half-stored, isolation, and idempotency keys (a queued photo sent again).
import { randomUUID } from 'node:crypto';
import { readdir } from 'node:fs/promises';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { Attachment } from '../../db/models/index';
import { createDiskFileStore } from '../../lib/storage/disk-file-store';
import type { FileStore } from '../../lib/storage/file-store';
import { createApp } from '../../app';
import { createLogger } from '../../lib/logger';
import { signedIn, testConfig, testSequelize } from '../../test/context';
import { createVehicle, createWorkshopWithTrees, testPassword } from '../../test/factories';
import { overheatingTreeKey } from '../../test/walks';

const uploadDir = mkdtempSync(join(tmpdir(), 'heatpath-uploads-'));
const store = createDiskFileStore(uploadDir);
const app = createApp({
  config: testConfig(),
  sequelize: testSequelize(),
  logger: createLogger('silent'),
  store,
});

const png = () =>
  sharp({ create: { width: 640, height: 480, channels: 3, background: '#b03020' } })
    .png()
    .toBuffer();
// The start of a Windows executable: "MZ" and a DOS stub.
const exe = Buffer.concat([Buffer.from('MZ'), Buffer.alloc(200, 0x90)]);

async function openCase() {
  const w = await createWorkshopWithTrees();
  const vehicle = await createVehicle(w.workshop.id);
  const tech = await signedIn(app, w.people.technician.email, testPassword);
  const res = await tech
    .post('/api/cases')
    .send({ vehicleId: vehicle.id, complaint: 'Overheats', treeId: w.trees[overheatingTreeKey] });
  return { ...w, tech, caseId: res.body.id as string };
}

async function filesOnDisk(): Promise<string[]> {
  return (await readdir(uploadDir, { recursive: true, withFileTypes: true }))
    .filter((d) => d.isFile())
    .map((d) => d.name);
}

describe('attachments', () => {
  it('stores a photo with a thumbnail and serves both back', async () => {
    const { tech, caseId } = await openCase();
    const res = await tech
      .post(`/api/cases/${caseId}/attachments`)
      .field('nodeId', 'locate-visible-leak')
      .field('photoOnly', 'true')
      .attach('file', await png(), 'leak.png');
    expect(res.status, res.text).toBe(201);
    expect(res.body).toMatchObject({
      kind: 'photo',
      mediaType: 'image/png',
      width: 640,
      height: 480,
      nodeId: 'locate-visible-leak',
      name: 'leak.png',
    });
    const file = await tech.get(res.body.url).buffer(true);
    expect(file.status).toBe(200);
    expect(file.headers['content-type']).toBe('image/png');
    const thumb = await tech.get(res.body.thumbnailUrl).buffer(true);
    expect(thumb.headers['content-type']).toBe('image/webp');
    const meta = await sharp(thumb.body as Buffer).metadata();
    expect(Math.max(meta.width ?? 0, meta.height ?? 0)).toBeLessThanOrEqual(360);
    const kase = await tech.get(`/api/cases/${caseId}`);
    expect(kase.body.attachments).toHaveLength(1);
  });

  it('refuses an executable named like a photo (415) and stores nothing', async () => {
    const { tech, caseId } = await openCase();
    const before = await filesOnDisk();
    const res = await tech
      .post(`/api/cases/${caseId}/attachments`)
      .attach('file', exe, { filename: 'photo.jpg', contentType: 'image/jpeg' });
    expect(res.status).toBe(415);
    expect(res.body.error.message).toMatch(/whatever its name says|cannot be attached/);
    expect(await filesOnDisk()).toEqual(before);
    expect(await Attachment.count({ where: { caseId } })).toBe(0);
  });

  it('refuses a PDF where the step asks for a photo, but accepts a CSV log on the case', async () => {
    const { tech, caseId } = await openCase();
    const pdf = Buffer.from('%PDF-1.4\n1 0 obj <<>> endobj\ntrailer <<>>\n%%EOF\n');
    const refused = await tech
      .post(`/api/cases/${caseId}/attachments`)
      .field('photoOnly', 'true')
      .attach('file', pdf, 'report.pdf');
    expect(refused.status).toBe(415);
    expect(refused.body.error.message).toMatch(/asks for a photo/);
    const csv = Buffer.from('time,coolant_c\n0,20\n60,45\n');
    const log = await tech
      .post(`/api/cases/${caseId}/attachments`)
      .attach('file', csv, 'road-test.csv');
    expect(log.status).toBe(201);
    expect(log.body.kind).toBe('log');
  });

  it('refuses an oversized file with 413 naming the limit', async () => {
    const { tech, caseId } = await openCase();
    const big = Buffer.alloc(13 * 1024 * 1024, 1);
    const res = await tech.post(`/api/cases/${caseId}/attachments`).attach('file', big, 'huge.png');
    expect(res.status).toBe(413);
    expect(res.body.error.message).toMatch(/12 MB/);
  });

  it('removes what was stored when a later part of the upload fails', async () => {
    const { caseId, people } = await openCase();
    let puts = 0;
    const failing: FileStore = {
      ...store,
      // The original is written; the thumbnail write then fails, as a full disk would.
      put: async (key, bytes, type) => {
        puts += 1;
        if (puts === 2)
          throw Object.assign(new Error('no space left on device'), { code: 'ENOSPC' });
        await store.put(key, bytes, type);
      },
    };
    const broken = createApp({
      config: testConfig(),
      sequelize: testSequelize(),
      logger: createLogger('silent'),
      store: failing,
    });
    const agent = await signedIn(broken, people.technician.email, testPassword);
    const before = await filesOnDisk();
    const res = await agent
      .post(`/api/cases/${caseId}/attachments`)
      .attach('file', await png(), 'leak.png');
    expect(res.status).toBe(500);
    expect(res.body.error.message).toMatch(/may not be saved/);
    expect(await filesOnDisk()).toEqual(before);
    expect(await Attachment.count({ where: { caseId } })).toBe(0);
  });

  it('never serves another workshop’s file', async () => {
    const mine = await openCase();
    const theirs = await openCase();
    const up = await theirs.tech
      .post(`/api/cases/${theirs.caseId}/attachments`)
      .attach('file', await png(), 'theirs.png');
    expect((await mine.tech.get(up.body.url)).status).toBe(404);
    expect(
      (await mine.tech.get(`/api/cases/${mine.caseId}/attachments/${up.body.id}/file`)).status,
    ).toBe(404);
    expect(
      (
        await mine.tech
          .post(`/api/cases/${theirs.caseId}/attachments`)
          .attach('file', await png(), 'x.png')
      ).status,
    ).toBe(404);
  });

  it('needs a file', async () => {
    const { tech, caseId } = await openCase();
    const res = await tech.post(`/api/cases/${caseId}/attachments`).field('nodeId', 'x');
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/Choose a file/);
  });
});

describe('attachments with an idempotency key', () => {
  const send = (
    agent: Awaited<ReturnType<typeof openCase>>['tech'],
    caseId: string,
    key: string,
    file: Buffer,
  ) =>
    agent
      .post(`/api/cases/${caseId}/attachments`)
      .field('nodeId', 'locate-visible-leak')
      .field('idempotencyKey', key)
      .attach('file', file, 'leak.png');

  it('stores the same file sent twice under one key once: 201, then 200 with the same JSON', async () => {
    const { tech, caseId } = await openCase();
    const key = randomUUID();
    const photo = await png();
    const before = await filesOnDisk();
    const first = await send(tech, caseId, key, photo);
    expect(first.status, first.text).toBe(201);
    const again = await send(tech, caseId, key, photo);
    expect(again.status, again.text).toBe(200);
    expect(again.body).toEqual(first.body);
    expect(await Attachment.count({ where: { caseId } })).toBe(1);
    // The original and its thumbnail, once.
    expect((await filesOnDisk()).length - before.length).toBe(2);
    const audit = await tech.get(`/api/cases/${caseId}/events`);
    expect(audit.body.events.filter((e: { kind: string }) => e.kind === 'attachment')).toHaveLength(
      1,
    );
  });

  it('refuses another file under a key already used (409) and keeps the first', async () => {
    const { tech, caseId } = await openCase();
    const key = randomUUID();
    const first = await send(tech, caseId, key, await png());
    expect(first.status, first.text).toBe(201);
    const other = await sharp({
      create: { width: 640, height: 480, channels: 3, background: '#2030b0' },
    })
      .png()
      .toBuffer();
    const before = await filesOnDisk();
    const refused = await send(tech, caseId, key, other);
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toMatch(/different file/);
    expect(await filesOnDisk()).toEqual(before);
    const kase = await tech.get(`/api/cases/${caseId}`);
    expect(kase.body.attachments.map((a: { id: string }) => a.id)).toEqual([first.body.id]);
  });

  it('stores one row when the same upload is sent twice at once', async () => {
    const { tech, caseId } = await openCase();
    const key = randomUUID();
    const photo = await png();
    const before = await filesOnDisk();
    const [a, b] = await Promise.all([
      send(tech, caseId, key, photo),
      send(tech, caseId, key, photo),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 201]);
    expect(a.body).toEqual(b.body);
    expect(await Attachment.count({ where: { caseId } })).toBe(1);
    expect((await filesOnDisk()).length - before.length).toBe(2);
  });

  it('refuses a key too short to be one', async () => {
    const { tech, caseId } = await openCase();
    const res = await send(tech, caseId, 'abc', await png());
    expect(res.status).toBe(400);
    expect(await Attachment.count({ where: { caseId } })).toBe(0);
  });
});
