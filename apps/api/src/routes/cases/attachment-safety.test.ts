// Uploads that are hostile or merely unusual: decompression bombs refused from the image's
// header before any pixel is decoded, file names kept as the person wrote them, and every
// stored file served with no-store so it leaves a shared workshop PC with the session.
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createDeflate } from 'node:zlib';
import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { createApp } from '../../app';
import { createLogger } from '../../lib/logger';
import { createDiskFileStore } from '../../lib/storage/disk-file-store';
import { signedIn, testConfig, testSequelize } from '../../test/context';
import { createVehicle, createWorkshopWithTrees, testPassword } from '../../test/factories';
import { approveLatest, diagnosedCase } from '../../test/repair-orders';
import { overheatingTreeKey } from '../../test/walks';

const app = createApp({
  config: testConfig(),
  sequelize: testSequelize(),
  logger: createLogger('silent'),
  store: createDiskFileStore(mkdtempSync(join(tmpdir(), 'heatpath-uploads-'))),
});

async function openCase() {
  const w = await createWorkshopWithTrees();
  const vehicle = await createVehicle(w.workshop.id);
  const tech = await signedIn(app, w.people.technician.email, testPassword);
  const res = await tech
    .post('/api/cases')
    .send({ vehicleId: vehicle.id, complaint: 'Overheats', treeId: w.trees[overheatingTreeKey] });
  expect(res.status, res.text).toBe(201);
  return { tech, caseId: res.body.id as string };
}

const crcTable = Array.from({ length: 256 }, (_, n) => {
  let c = n;
  for (let k = 0; k < 8; k += 1) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  return c >>> 0;
});
function crc32(bytes: Buffer): number {
  let c = 0xffffffff;
  for (const b of bytes) c = crcTable[(c ^ b) & 0xff]! ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}
function chunk(type: string, data: Buffer): Buffer {
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([length, body, crc]);
}

/**
 * A genuine 1-bit black PNG of the given size, written row by row: a few hundred kilobytes of
 * compressed zeros that claim width × height pixels once decoded.
 */
async function blackPng(width: number, height: number): Promise<Buffer> {
  const deflate = createDeflate({ level: 9 });
  const parts: Buffer[] = [];
  deflate.on('data', (b: Buffer) => parts.push(b));
  const done = new Promise((resolve) => deflate.on('end', resolve));
  const row = Buffer.alloc(1 + Math.ceil(width / 8)); // filter byte 0, then all-black pixels
  const rows = Buffer.concat(Array.from({ length: 64 }, () => row));
  for (let y = 0; y < height; y += 64) {
    const n = Math.min(64, height - y);
    if (!deflate.write(n === 64 ? rows : rows.subarray(0, n * row.length)))
      await new Promise((resolve) => deflate.once('drain', resolve));
  }
  deflate.end();
  await done;
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr.set([1, 0, 0, 0, 0], 8); // bit depth 1, greyscale, deflate, no filter, no interlace
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', ihdr),
    chunk('IDAT', Buffer.concat(parts)),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

describe('image decompression bombs', () => {
  it('refuses a 40000 × 40000 PNG and a 260-megapixel one with 413, decoding nothing', async () => {
    const { tech, caseId } = await openCase();
    for (const [width, height] of [
      [40_000, 40_000],
      [16_125, 16_125],
    ] as const) {
      const bomb = await blackPng(width, height);
      expect(bomb.length).toBeLessThan(12 * 1024 * 1024);
      const res = await tech
        .post(`/api/cases/${caseId}/attachments`)
        .attach('file', bomb, { filename: 'black.png', contentType: 'image/png' });
      expect(res.status, res.text).toBe(413);
      expect(res.body.error).toMatchObject({ code: 'payload_too_large' });
      expect(res.body.error.message).toContain(`${width} × ${height} pixels`);
      expect(res.body.error.message).toContain('up to 50 megapixels');
    }
    const kase = await tech.get(`/api/cases/${caseId}`);
    expect(kase.body.attachments).toEqual([]);
  });

  it('still takes an ordinary photo made the same way', async () => {
    const { tech, caseId } = await openCase();
    // The generator is the same, so the refusal above is the size and not the file.
    const res = await tech
      .post(`/api/cases/${caseId}/attachments`)
      .attach('file', await blackPng(1200, 900), {
        filename: 'small.png',
        contentType: 'image/png',
      });
    expect(res.status, res.text).toBe(201);
    expect(res.body).toMatchObject({ width: 1200, height: 900, kind: 'photo' });
  });
});

describe('file names and caching', () => {
  it('keeps a UTF-8 file name as written and serves it back in the download', async () => {
    const { tech, caseId } = await openCase();
    const photo = await sharp({
      create: { width: 64, height: 48, channels: 3, background: '#204060' },
    })
      .png()
      .toBuffer();
    const res = await tech
      .post(`/api/cases/${caseId}/attachments`)
      .attach('file', photo, { filename: 'Kühler – vorn.png', contentType: 'image/png' });
    expect(res.status, res.text).toBe(201);
    expect(res.body.name).toBe('Kühler – vorn.png');
    const kase = await tech.get(`/api/cases/${caseId}`);
    expect(kase.body.attachments[0].name).toBe('Kühler – vorn.png');
    const file = await tech.get(res.body.url).buffer(true);
    expect(file.headers['content-disposition']).toContain(
      `filename*=UTF-8''${encodeURIComponent('Kühler – vorn.png')}`,
    );
  });

  it('serves photos, thumbnails, repair-order exports and logs with no-store', async () => {
    const { caseId, photoId, tech, advisor } = await diagnosedCase(app);
    const kase = await tech.get(`/api/cases/${caseId}`);
    const photo = (
      kase.body.attachments as { id: string; url: string; thumbnailUrl: string }[]
    ).find((a) => a.id === photoId)!;
    await approveLatest(advisor, caseId);
    for (const [agent, url] of [
      [tech, photo.url],
      [tech, photo.thumbnailUrl],
      [tech, `/api/cases/${caseId}/logs`],
      [advisor, `/api/cases/${caseId}/findings/export/csv`],
      [advisor, `/api/cases/${caseId}/findings/export/pdf`],
    ] as const) {
      const res = await agent.get(url).buffer(true);
      expect(res.status, url).toBe(200);
      expect(res.headers['cache-control'], url).toBe('no-store');
    }
  });
});
