// Temperature logs on cases, against the real database: a good export is stored with its
// analysis; an ambiguous one asks for its columns and the mapping finishes it without a second
// upload; the mapping is remembered per source and workshop (and can still be changed); bad
// files are refused naming the line, with nothing stored; roles and isolation.
import { mkdtempSync } from 'node:fs';
import { readdir } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { randomUUID } from 'node:crypto';
import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { roles } from '@heatpath/contracts';
import type { LogNeedsMapping, LogStored, Role, TemperatureLogDetail } from '@heatpath/contracts';
import { logCsv, syntheticLog } from '@heatpath/temperature-log/testing';
import sharp from 'sharp';
import { createApp } from '../../app';
import {
  Attachment,
  TemperatureLog,
  TemperatureLogMapping,
  TemperatureLogUpload,
} from '../../db/models/index';
import { createLogger } from '../../lib/logger';
import { createDiskFileStore } from '../../lib/storage/disk-file-store';
import type { FileStore } from '../../lib/storage/file-store';
import { clientHeaders, signedIn, testConfig, testSequelize } from '../../test/context';
import { createVehicle, createWorkshopWithTrees, testPassword } from '../../test/factories';
import { overheatingTreeKey } from '../../test/walks';

const uploadDir = mkdtempSync(join(tmpdir(), 'heatpath-logs-'));
const store = createDiskFileStore(uploadDir);
const appWith = (fileStore: FileStore) =>
  createApp({
    config: testConfig(),
    sequelize: testSequelize(),
    logger: createLogger('silent'),
    store: fileStore,
  });
const app = appWith(store);

/** A road test: warm-up from 20 °C, thermostat opening at 88 °C, one episode peaking at 114.5 °C. */
const roadTest = syntheticLog({
  seed: 7,
  durationSeconds: 3600,
  startC: 20,
  closedAsymptoteC: 130,
  timeConstantSeconds: 900,
  openingC: 88,
  episodes: [{ startSeconds: 2400, durationSeconds: 180, peakC: 116 }],
  noiseK: 0.2,
});
const goodCsv = Buffer.from(logCsv(roadTest));
// No header at all, temperatures in °F: the columns and the unit must be asked for.
const headerlessF = (seed: number, durationSeconds = 1800) =>
  Buffer.from(
    logCsv(
      syntheticLog({
        seed,
        durationSeconds,
        startC: 15,
        closedAsymptoteC: 125,
        timeConstantSeconds: 600,
        openingC: 90,
        noiseK: 0.1,
      }),
      { header: false, unit: 'degF' },
    ),
  );

async function openCase() {
  const w = await createWorkshopWithTrees();
  const vehicle = await createVehicle(w.workshop.id);
  const tech = await signedIn(app, w.people.technician.email, testPassword);
  const res = await tech
    .post('/api/cases')
    .send({ vehicleId: vehicle.id, complaint: 'Overheats', treeId: w.trees[overheatingTreeKey] });
  expect(res.status, res.text).toBe(201);
  return { ...w, tech, vehicle, caseId: res.body.id as string };
}

type Agent = Awaited<ReturnType<typeof signedIn>>;
const upload = (agent: Agent, caseId: string, bytes: Buffer, name = 'road-test.csv') =>
  agent.post(`/api/cases/${caseId}/logs`).attach('file', bytes, name);

async function filesOnDisk(): Promise<string[]> {
  return (await readdir(uploadDir, { recursive: true, withFileTypes: true }))
    .filter((d) => d.isFile())
    .map((d) => join(d.parentPath, d.name))
    .sort();
}

async function storedRows(caseId: string) {
  return {
    attachments: await Attachment.count({ where: { caseId } }),
    logs: await TemperatureLog.count({ where: { caseId } }),
    pending: await TemperatureLogUpload.count({ where: { caseId } }),
  };
}

describe('uploading a log that reads itself', () => {
  it('stores the file and the series with the analysis, candidate readings and a thinned chart', async () => {
    const { tech, caseId } = await openCase();
    const res = await tech
      .post(`/api/cases/${caseId}/logs`)
      .field('nodeId', 'warm-up-live-data')
      .attach('file', goodCsv, 'road-test.csv');
    expect(res.status, res.text).toBe(201);
    const body = res.body as LogStored;
    expect(body.status).toBe('stored');
    const log = body.log;
    expect(log).toMatchObject({
      caseId,
      nodeId: 'warm-up-live-data',
      name: 'road-test.csv',
      readings: 3601,
      durationSeconds: 3600,
      mappingSource: 'detected',
      mapping: { time: 0, coolant: 1, temperatureUnit: 'degC' },
      detected: { delimiter: ',', header: true, timeFormat: 'seconds', unit: 'degC' },
      channels: [],
    });
    // The analysis finds what the model put there (tolerances as the package's own tests use).
    expect(log.analysis.opening.found).toBe(true);
    if (log.analysis.opening.found) {
      expect(log.analysis.opening.temperatureC).toBeGreaterThan(86);
      expect(log.analysis.opening.temperatureC).toBeLessThan(90);
      expect(log.analysis.opening.atSeconds).toBeCloseTo(roadTest.truth.openingSeconds, -2);
    }
    expect(log.analysis.overTemperature.episodes).toHaveLength(1);
    const [episode] = log.analysis.overTemperature.episodes;
    expect(episode!.startSeconds).toBeCloseTo(2400, -1);
    expect(episode!.durationSeconds).toBeCloseTo(180, -1);
    expect(episode!.peakC).toBeCloseTo(114.5, 0);
    expect(log.headline.episodes).toBe(1);
    const names = log.candidateReadings.map((r) => r.name);
    expect(names).toContain('thermostatOpeningC');
    expect(names).toContain('peakCoolantC');
    expect(log.candidateReadings.every((r) => r.needsConfirmation)).toBe(true);
    // 3,601 readings thinned to at most 2,000, the peak kept.
    expect(log.series.downsampled).toBe(true);
    expect(log.series.times.length).toBeLessThanOrEqual(2000);
    expect(log.series.times.length).toBe(log.series.coolantC.length);
    expect(Math.max(...log.series.coolantC)).toBe(Math.max(...roadTest.coolantC.map(round2)));
    expect(log.series.times[0]).toBe(0);
    expect(log.series.times.at(-1)).toBe(3600);

    // The original file is an attachment of the step, served back byte for byte.
    const file = await tech.get(log.fileUrl);
    expect(file.status).toBe(200);
    expect(file.text).toBe(goodCsv.toString('utf8'));
    const kase = await tech.get(`/api/cases/${caseId}`);
    expect(kase.body.attachments).toEqual([
      expect.objectContaining({ id: log.attachmentId, kind: 'log', nodeId: 'warm-up-live-data' }),
    ]);
    const events = await tech.get(`/api/cases/${caseId}/events`);
    expect(events.body.events.map((e: { kind: string }) => e.kind)).toContain('attachment');
  });

  it('lists the case’s logs and serves one with other analysis settings and a zoomed window', async () => {
    const { tech, caseId } = await openCase();
    const stored = (await upload(tech, caseId, goodCsv)).body as LogStored;
    const list = await tech.get(`/api/cases/${caseId}/logs`);
    expect(list.status).toBe(200);
    expect(list.body.logs).toHaveLength(1);
    expect(list.body.logs[0]).toMatchObject({ id: stored.log.id, headline: { episodes: 1 } });
    expect(list.body.logs[0].series).toBeUndefined();

    const detail = await tech.get(`/api/cases/${caseId}/logs/${stored.log.id}`);
    expect(detail.status).toBe(200);
    expect(detail.body.analysis).toEqual(stored.log.analysis);

    // A threshold above the peak: no episode. One below the regulated 88 °C would find the log hot.
    const higher = await tech.get(`/api/cases/${caseId}/logs/${stored.log.id}?threshold=120`);
    expect(higher.status, higher.text).toBe(200);
    expect(higher.body.analysis.overTemperature).toMatchObject({ thresholdC: 120, episodes: [] });
    expect(higher.body.candidateReadings.map((r: { name: string }) => r.name)).not.toContain(
      'longestOverTemperatureMinutes',
    );
    const lower = await tech.get(`/api/cases/${caseId}/logs/${stored.log.id}?threshold=105`);
    expect(lower.body.analysis.overTemperature.episodes[0].durationSeconds).toBeGreaterThan(180);

    // Zoomed to the episode: every reading of the window, nothing thinned.
    const zoom = (await tech.get(`/api/cases/${caseId}/logs/${stored.log.id}?from=2300&to=2700`))
      .body as TemperatureLogDetail;
    expect(zoom.series).toMatchObject({ from: 2300, to: 2700, readingsInWindow: 401 });
    expect(zoom.series.downsampled).toBe(false);
    expect(zoom.series.times[0]).toBe(2300);
    expect(zoom.series.times.at(-1)).toBe(2700);

    const refused = await tech.get(`/api/cases/${caseId}/logs/${stored.log.id}?threshold=hot`);
    expect(refused.status).toBe(400);
    expect(refused.body.error.fields.threshold).toMatch(/temperature in °C/);
    const backwards = await tech.get(`/api/cases/${caseId}/logs/${stored.log.id}?from=50&to=10`);
    expect(backwards.status).toBe(400);
  });
});

describe('the engine the case’s vehicle has, and analyses stored by older rules', () => {
  it('reads a stall at 70 °C as the shroud releasing when the vehicle names a switchable pump', async () => {
    // The shroud releasing is a stall in the warm-up, not the thermostat opening
    // (cooling-diagnosis.md, switchable main pump; common practice).
    const { tech, caseId, vehicle } = await openCase();
    await vehicle.update({ engine: '1.4 turbo petrol, switchable coolant pump' });
    const shroudLog = syntheticLog({
      seed: 1207,
      durationSeconds: 2400,
      startC: 20,
      closedAsymptoteC: 125,
      timeConstantSeconds: 400,
      openingC: 88,
      noiseK: 0.3,
      shroud: { releaseC: 70, timeConstantAfterSeconds: 900 },
    });
    const res = await upload(tech, caseId, Buffer.from(logCsv(shroudLog)));
    expect(res.status, res.text).toBe(201);
    const { analysis } = (res.body as LogStored).log;
    expect(analysis.options.switchablePump).toBe(true);
    expect(analysis.shroudRelease.found && analysis.shroudRelease.reading).toBe('shroud-release');
    expect(analysis.opening.found && Math.abs(analysis.opening.temperatureC - 88)).toBeLessThan(2);

    // The description changes: the log is worked out again with both readings.
    await vehicle.update({ engine: '1.4 turbo petrol' });
    const detail = await tech.get(`/api/cases/${caseId}/logs/${(res.body as LogStored).log.id}`);
    expect(detail.body.analysis.options.switchablePump).toBeNull();
    expect(detail.body.analysis.shroudRelease.reading).toBe('shroud-release-or-early-opening');
  });

  it('works out again, and stores back, an analysis made before the current rules', async () => {
    const { tech, caseId } = await openCase();
    const stored = (await upload(tech, caseId, goodCsv)).body as LogStored;
    // What an analysis from before looked like: no version, no shroud release, and an opening
    // read off an over-temperature plateau.
    const { version: _version, shroudRelease: _shroud, ...legacy } = stored.log.analysis;
    await TemperatureLog.update(
      {
        analysis: {
          ...legacy,
          opening: { ...legacy.opening, found: true, temperatureC: 117.95, atSeconds: 2450 },
        } as unknown as TemperatureLog['analysis'],
      },
      { where: { id: stored.log.id } },
    );
    const detail = await tech.get(`/api/cases/${caseId}/logs/${stored.log.id}`);
    expect(detail.status, detail.text).toBe(200);
    expect(detail.body.analysis).toEqual(stored.log.analysis);
    const row = await TemperatureLog.findByPk(stored.log.id);
    expect(row?.analysis.version).toBe(stored.log.analysis.version);
    const list = await tech.get(`/api/cases/${caseId}/logs`);
    expect(list.body.logs[0].headline.openingC).toBeLessThan(90);
  });
});

describe('a log whose columns are ambiguous', () => {
  it('asks for the mapping, keeps the file, and the mapping finishes it without a second upload', async () => {
    const { tech, caseId } = await openCase();
    const bytes = headerlessF(11);
    const before = await filesOnDisk();
    const asked = await upload(tech, caseId, bytes, 'logger.csv');
    expect(asked.status, asked.text).toBe(200);
    const needs = asked.body as LogNeedsMapping;
    expect(needs).toMatchObject({ status: 'needs-mapping', name: 'logger.csv' });
    expect(needs.sourceSignature).toMatch(/^tl1-[0-9a-f]{16}$/);
    expect(needs.columns).toHaveLength(2);
    expect(needs.columns[0]).toMatchObject({ index: 0, header: null, looksLike: 'number' });
    expect(needs.unsure.length).toBeGreaterThan(0);
    expect(needs.reasons.length).toBeGreaterThan(0);
    // The file is kept in storage, not yet on the case.
    expect(await storedRows(caseId)).toEqual({ attachments: 0, logs: 0, pending: 1 });
    expect((await filesOnDisk()).length).toBe(before.length + 1);

    // Leaving out the unit: asked again, for the same upload, only for the unit.
    const unitOnly = await tech
      .post(`/api/cases/${caseId}/logs/${needs.pendingUploadId}/mapping`)
      .send({ mapping: { time: 0, coolant: 1 } });
    expect(unitOnly.status, unitOnly.text).toBe(200);
    expect(unitOnly.body).toMatchObject({
      status: 'needs-mapping',
      pendingUploadId: needs.pendingUploadId,
      unsure: ['temperatureUnit'],
    });

    const done = await tech
      .post(`/api/cases/${caseId}/logs/${needs.pendingUploadId}/mapping`)
      .send({ mapping: { time: 0, coolant: 1, temperatureUnit: 'degF' } });
    expect(done.status, done.text).toBe(201);
    const log = (done.body as LogStored).log;
    expect(log).toMatchObject({
      name: 'logger.csv',
      mappingSource: 'confirmed',
      mapping: { time: 0, coolant: 1, temperatureUnit: 'degF' },
    });
    expect(log.columns).toHaveLength(2);
    // Read in °F and stored in °C: the opening near 90 °C, not 194.
    expect(log.headline.openingC).toBeGreaterThan(87);
    expect(log.headline.openingC).toBeLessThan(92);
    expect(await storedRows(caseId)).toEqual({ attachments: 1, logs: 1, pending: 0 });
    // The kept bytes became the attachment: nothing copied, nothing left over.
    expect((await filesOnDisk()).length).toBe(before.length + 1);
    const file = await tech.get(log.fileUrl);
    expect(file.text).toBe(bytes.toString('utf8'));

    const again = await tech
      .post(`/api/cases/${caseId}/logs/${needs.pendingUploadId}/mapping`)
      .send({ mapping: { time: 0, coolant: 1, temperatureUnit: 'degF' } });
    expect(again.status).toBe(404);
    expect(again.body.error.message).toMatch(/no longer waiting/);
  });

  it('refuses a mapping that reads the file wrongly, naming the line, and keeps the upload waiting', async () => {
    const { tech, caseId } = await openCase();
    const text = ['Clock,Reading A,Reading B', ...ten((i) => `${i},${80 + i},OK`)].join('\n');
    const needs = (await upload(tech, caseId, Buffer.from(text))).body as LogNeedsMapping;
    expect(needs.status).toBe('needs-mapping');
    const wrong = await tech
      .post(`/api/cases/${caseId}/logs/${needs.pendingUploadId}/mapping`)
      .send({ mapping: { time: 0, coolant: 2, temperatureUnit: 'degC' } });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.message).toMatch(/^Line 2: column 3 \("Reading B"\)/);
    const outside = await tech
      .post(`/api/cases/${caseId}/logs/${needs.pendingUploadId}/mapping`)
      .send({ mapping: { time: 0, coolant: 5, temperatureUnit: 'degC' } });
    expect(outside.status).toBe(400);
    expect(outside.body.error.fields.mapping).toMatch(/file has 3 columns/);
    const malformed = await tech
      .post(`/api/cases/${caseId}/logs/${needs.pendingUploadId}/mapping`)
      .send({ mapping: { time: 'first', coolant: 1 } });
    expect(malformed.status).toBe(400);
    expect(malformed.body.error.fields['mapping.time']).toBeDefined();
    expect(await storedRows(caseId)).toEqual({ attachments: 0, logs: 0, pending: 1 });
    const right = await tech
      .post(`/api/cases/${caseId}/logs/${needs.pendingUploadId}/mapping`)
      .send({ mapping: { time: 0, coolant: 1, temperatureUnit: 'degC' } });
    expect(right.status, right.text).toBe(201);
  });

  it('takes a mapping sent with the upload itself', async () => {
    const { tech, caseId } = await openCase();
    const res = await tech
      .post(`/api/cases/${caseId}/logs`)
      .field('mapping', JSON.stringify({ time: 0, coolant: 1, temperatureUnit: 'degF' }))
      .attach('file', headerlessF(3), 'logger.csv');
    expect(res.status, res.text).toBe(201);
    expect(res.body.log.mappingSource).toBe('confirmed');
    expect(res.body.log.columns).toHaveLength(2);
    const bad = await tech
      .post(`/api/cases/${caseId}/logs`)
      .field('mapping', '{time: 0')
      .attach('file', headerlessF(3), 'logger.csv');
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toMatch(/not valid JSON/);
  });
});

describe('remembered mappings', () => {
  it('applies the confirmed mapping to the next log from the same source, per workshop, and lets it be changed', async () => {
    const mine = await openCase();
    const first = (await upload(mine.tech, mine.caseId, headerlessF(21))).body as LogNeedsMapping;
    await mine.tech
      .post(`/api/cases/${mine.caseId}/logs/${first.pendingUploadId}/mapping`)
      .send({ mapping: { time: 0, coolant: 1, temperatureUnit: 'degF' } })
      .expect(201);
    const remembered = await TemperatureLogMapping.findAll({
      where: { workshopId: mine.workshop.id },
    });
    expect(remembered.map((r) => r.sourceSignature)).toEqual([first.sourceSignature]);

    // Another export of the same layout (other readings, other length) on another case.
    const vehicle = await createVehicle(mine.workshop.id);
    const other = await mine.tech.post('/api/cases').send({
      vehicleId: vehicle.id,
      complaint: 'Runs hot',
      treeId: mine.trees[overheatingTreeKey],
    });
    const next = await upload(mine.tech, other.body.id, headerlessF(22, 2400), 'logger-2.csv');
    expect(next.status, next.text).toBe(201);
    const log = (next.body as LogStored).log;
    expect(log).toMatchObject({
      mappingSource: 'remembered',
      sourceSignature: first.sourceSignature,
      mapping: { time: 0, coolant: 1, temperatureUnit: 'degF' },
    });
    expect(log.columns).toHaveLength(2);

    // Still the person's to change: read as °C instead (the values then are out of range)...
    const refused = await mine.tech
      .put(`/api/cases/${other.body.id}/logs/${log.id}/mapping`)
      .send({ mapping: { time: 0, coolant: 1, temperatureUnit: 'degC' } });
    expect(refused.status).toBe(400);
    expect(refused.body.error.message).toMatch(/^Line \d+: .*outside -50 to 150 °C/);
    // ...or swap nothing but say minutes for the time: accepted, stored, remembered.
    const changed = await mine.tech
      .put(`/api/cases/${other.body.id}/logs/${log.id}/mapping`)
      .send({ mapping: { time: 0, coolant: 1, temperatureUnit: 'degF', timeUnit: 'minutes' } });
    expect(changed.status, changed.text).toBe(200);
    expect(changed.body).toMatchObject({
      id: log.id,
      mappingSource: 'confirmed',
      durationSeconds: 2400 * 60,
    });
    const row = await TemperatureLogMapping.findOne({
      where: { workshopId: mine.workshop.id, sourceSignature: first.sourceSignature },
    });
    expect(row?.mapping.timeUnit).toBe('minutes');

    // Another workshop has not confirmed anything for this source: it is asked.
    const theirs = await openCase();
    const asked = await upload(theirs.tech, theirs.caseId, headerlessF(23));
    expect(asked.status).toBe(200);
    expect(asked.body.status).toBe('needs-mapping');
  });
});

const round2 = (v: number) => Number(v.toFixed(2));
const ten = (line: (i: number) => string) => Array.from({ length: 10 }, (_, i) => line(i));

describe('bad files', () => {
  const png = () =>
    sharp({ create: { width: 8, height: 8, channels: 3, background: '#000' } })
      .png()
      .toBuffer();
  const cases: [string, () => Buffer | Promise<Buffer>, RegExp][] = [
    ['an empty file', () => Buffer.alloc(0), /^Line 1: the file is empty\./],
    ['a photo named .csv', png, /^Line \d+: the file contains binary data/],
    [
      'one column',
      () => Buffer.from(['Coolant', ...ten((i) => String(80 + i))].join('\n')),
      /^Line 1: the file has one column/,
    ],
    [
      'a temperature that is not a number',
      () =>
        Buffer.from(
          ['Time,Coolant (°C)', ...ten((i) => `${i},${i === 6 ? 'n/a' : 80 + i}`)].join('\n'),
        ),
      /^Line 8: column 2 \("Coolant \(°C\)"\): the coolant temperature "n\/a" is not a number/,
    ],
    [
      'time going backwards',
      () =>
        Buffer.from(
          ['Time,Coolant (°C)', ...ten((i) => `${i === 4 ? 1.5 : i},${80 + i}`)].join('\n'),
        ),
      /^Line 6: the time goes backwards/,
    ],
    [
      'an absurd temperature',
      () =>
        Buffer.from(
          ['Time,Coolant (°C)', ...ten((i) => `${i},${i === 7 ? 350 : 80 + i}`)].join('\n'),
        ),
      /^Line 9: .*350 °C.* is outside -50 to 150 °C/,
    ],
    [
      'too few readings',
      () => Buffer.from(['Time,Coolant (°C)', '0,80', '1,81', '2,82'].join('\n')),
      /^Line \d+: the log ends here after 3 readings/,
    ],
  ];

  it.each(cases)('%s → 400 naming the line, nothing stored', async (_name, bytes, message) => {
    const { tech, caseId } = await openCase();
    const before = await filesOnDisk();
    const res = await upload(tech, caseId, await bytes(), 'log.csv');
    expect(res.status, res.text).toBe(400);
    expect(res.body.error.code).toBe('bad_request');
    expect(res.body.error.message).toMatch(message);
    expect(res.body.error.fields.file).toBe(res.body.error.message);
    expect(await storedRows(caseId)).toEqual({ attachments: 0, logs: 0, pending: 0 });
    expect(await filesOnDisk()).toEqual(before);
  });

  it('refuses a file over 20 MB with 413 and a request without a file with 400', async () => {
    const { tech, caseId } = await openCase();
    const big = Buffer.alloc(21 * 1024 * 1024, 0x31);
    const res = await upload(tech, caseId, big);
    expect(res.status).toBe(413);
    expect(res.body.error.message).toMatch(/20 MB/);
    const none = await tech.post(`/api/cases/${caseId}/logs`).field('nodeId', 'x');
    expect(none.status).toBe(400);
    expect(none.body.error.message).toMatch(/Choose a log file/);
  });
});

describe('nothing half-stored', () => {
  it('removes the stored file when the rows cannot be written', async () => {
    const { tech, caseId, workshop, people } = await openCase();
    // The case is full: the transaction refuses after the bytes were stored.
    await Attachment.bulkCreate(
      Array.from({ length: 60 }, (_, i) => ({
        caseId,
        workshopId: workshop.id,
        nodeId: null,
        kind: 'file' as const,
        storageKey: `${workshop.id}/${caseId}/filler-${i}`,
        thumbnailKey: null,
        originalName: `filler-${i}.pdf`,
        mediaType: 'application/pdf',
        byteSize: 1,
        width: null,
        height: null,
        uploadedBy: people.technician.id,
      })),
    );
    const before = await filesOnDisk();
    const res = await upload(tech, caseId, goodCsv);
    expect(res.status).toBe(413);
    expect(res.body.error.message).toMatch(/at most 60 files/);
    expect(await filesOnDisk()).toEqual(before);
    expect(await TemperatureLog.count({ where: { caseId } })).toBe(0);
  });

  it('writes no rows when storage fails', async () => {
    const { caseId, people } = await openCase();
    const failing: FileStore = {
      ...store,
      put: async () => {
        throw Object.assign(new Error('no space left on device'), { code: 'ENOSPC' });
      },
    };
    const agent = await signedIn(appWith(failing), people.technician.email, testPassword);
    const res = await upload(agent, caseId, goodCsv);
    expect(res.status).toBe(500);
    expect(res.body.error.message).toMatch(/may not be saved/);
    expect(await storedRows(caseId)).toEqual({ attachments: 0, logs: 0, pending: 0 });
    const ambiguous = await upload(agent, caseId, headerlessF(5));
    expect(ambiguous.status).toBe(500);
    expect(await storedRows(caseId)).toEqual({ attachments: 0, logs: 0, pending: 0 });
  });
});

describe('log routes × roles and workshops', () => {
  interface Fixture {
    caseId: string;
    logId: string;
    pendingUploadId: string;
  }
  interface LogRoute {
    label: string;
    call: (agent: Agent | supertest.Agent, f: Fixture) => supertest.Test;
    allowed: readonly Role[];
    ok: number;
  }
  const readers: Role[] = ['lead', 'technician', 'advisor'];
  const uploaders: Role[] = ['lead', 'technician'];
  const confirmF = { mapping: { time: 0, coolant: 1, temperatureUnit: 'degF' } };
  const routes: LogRoute[] = [
    {
      label: 'GET /logs',
      call: (a, f) => a.get(`/api/cases/${f.caseId}/logs`),
      allowed: readers,
      ok: 200,
    },
    {
      label: 'GET /logs/:logId',
      call: (a, f) => a.get(`/api/cases/${f.caseId}/logs/${f.logId}?threshold=105`),
      allowed: readers,
      ok: 200,
    },
    {
      label: 'POST /logs',
      call: (a, f) => a.post(`/api/cases/${f.caseId}/logs`).attach('file', goodCsv, 'log.csv'),
      allowed: uploaders,
      ok: 201,
    },
    {
      label: 'POST /logs/:pendingUploadId/mapping',
      call: (a, f) =>
        a.post(`/api/cases/${f.caseId}/logs/${f.pendingUploadId}/mapping`).send(confirmF),
      allowed: uploaders,
      ok: 201,
    },
    {
      label: 'PUT /logs/:logId/mapping',
      call: (a, f) =>
        a
          .put(`/api/cases/${f.caseId}/logs/${f.logId}/mapping`)
          .send({ mapping: { time: 0, coolant: 1, temperatureUnit: 'degC' } }),
      allowed: uploaders,
      ok: 200,
    },
  ];

  async function fixture() {
    const w = await openCase();
    const stored = (await upload(w.tech, w.caseId, goodCsv)).body as LogStored;
    const pending = (await upload(w.tech, w.caseId, headerlessF(9))).body as LogNeedsMapping;
    return {
      w,
      f: { caseId: w.caseId, logId: stored.log.id, pendingUploadId: pending.pendingUploadId },
    };
  }

  for (const route of routes) {
    for (const role of roles) {
      const allowed = route.allowed.includes(role);
      it(`${route.label} as ${role} → ${allowed ? route.ok : 403}`, async () => {
        const { w, f } = await fixture();
        const agent = await signedIn(app, w.people[role].email, testPassword);
        const res = await route.call(agent, f);
        expect(res.status, res.text).toBe(allowed ? route.ok : 403);
      });
    }
    it(`${route.label} unauthenticated → 401`, async () => {
      const { f } = await fixture();
      const res = await route.call(supertest.agent(app).set(clientHeaders), f);
      expect(res.status).toBe(401);
    });
  }

  it('another workshop’s case, log or upload is not found on every route', async () => {
    const mine = await fixture();
    const theirs = await fixture();
    const lead = await signedIn(app, mine.w.people.lead.email, testPassword);
    for (const route of routes) {
      // Their case with their ids; and my case with their log or upload id.
      const namesRecord = route.label.includes(':');
      for (const f of [
        theirs.f,
        ...(namesRecord ? [{ ...theirs.f, caseId: mine.f.caseId }] : []),
      ]) {
        const res = await route.call(lead, f);
        expect(res.status, `${route.label}: ${res.text}`).toBe(404);
      }
    }
    expect(await storedRows(theirs.f.caseId)).toEqual({ attachments: 1, logs: 1, pending: 1 });
    const unknown = await lead.get(`/api/cases/${mine.f.caseId}/logs/${randomUUID()}`);
    expect(unknown.body.error.message).toMatch(/temperature log was not found/);
  });
});
