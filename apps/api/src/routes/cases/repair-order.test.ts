// The repair order of a diagnosed case through the API: the advisor's versioned edits with who
// changed what, photos chosen, approval frozen by the database, and the exports of a known case
// read back — the PDF's text (pdf-parse), the CSV (csv-parse) and the JSON (its zod schema).
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { parse } from 'csv-parse/sync';
import { PDFParse } from 'pdf-parse';
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { repairOrderCsvColumns, repairOrderExportSchema } from '@heatpath/contracts';
import { testApp, testSequelize } from '../../test/context';
import { approveLatest, diagnosedCase, editOf } from '../../test/repair-orders';
import type { Agent } from '../../test/repair-orders';

const app = testApp();

const binary = (agent: Agent, path: string) =>
  agent
    .get(path)
    .buffer(true)
    .parse((res, done) => {
      const chunks: Buffer[] = [];
      res.on('data', (chunk: Buffer) => chunks.push(chunk));
      res.on('end', () => done(null, Buffer.concat(chunks)));
    });

async function pdfText(bytes: Buffer): Promise<{ text: string; pages: number }> {
  const parser = new PDFParse({ data: new Uint8Array(bytes) });
  try {
    const result = await parser.getText();
    return { text: result.text.replace(/\s+/g, ' '), pages: result.total };
  } finally {
    await parser.destroy();
  }
}

/** The advisor's review edit used below: a part added, labour changed, the photo chosen. */
async function reviewAndEdit(advisor: Agent, caseId: string, photoId: string | null) {
  const review = await advisor.get(`/api/cases/${caseId}/findings/review`);
  expect(review.status, review.text).toBe(200);
  const current = review.body.current;
  const edit = {
    ...editOf(current),
    correction: `${current.correction} Customer agreed by phone.`,
    parts: [
      ...current.parts,
      { description: 'Coolant, 50 % pre-mix', quantity: 6, partNumber: 'HP-CL-50' },
    ],
    labour: current.labour.map((l: { operation: string; hours: number }, i: number) =>
      i === 0 ? { ...l, hours: l.hours + 0.5 } : l,
    ),
    photoIds: photoId ? [photoId] : [],
  };
  const saved = await advisor.put(`/api/cases/${caseId}/findings`).send(edit);
  expect(saved.status, saved.text).toBe(200);
  return { before: current, edit };
}

describe('reviewing the findings of a diagnosed case', () => {
  it('keeps every save as a revision with who changed what, and the photos chosen', async () => {
    const { caseId, photoId, advisor, w } = await diagnosedCase(app);
    const { before } = await reviewAndEdit(advisor, caseId, photoId);
    expect(before.revision).toBe(1);

    const review = await advisor.get(`/api/cases/${caseId}/findings/review`);
    expect(review.body.current.revision).toBe(2);
    expect(review.body.revisions.map((r: { revision: number }) => r.revision)).toEqual([2, 1]);
    const [latest, first] = review.body.revisions;
    expect(first.savedBy.name).toBe(w.people.technician.name);
    expect(first.changes).toEqual(['Drafted from the finding the walk reached']);
    expect(latest.savedBy.name).toBe(w.people.advisor.name);
    expect(latest.changes).toEqual(
      expect.arrayContaining([
        'Correction edited',
        'Part added: Coolant, 50 % pre-mix × 6 (HP-CL-50)',
        'Photos chosen: 1 for the repair order',
      ]),
    );
    expect(latest.changes.some((c: string) => c.startsWith('Labour changed:'))).toBe(true);
    expect(review.body.current.photoIds).toEqual([photoId]);
    // The case's photos to choose from: the shroud, and the two the walk required.
    expect(review.body.photos).toHaveLength(3);
    expect(review.body.photos.find((p: { id: string }) => p.id === photoId)).toMatchObject({
      stepTitle: expect.any(String),
    });
    expect(review.body.current.readings[0]).toMatchObject({ display: expect.any(String) });
    expect(review.body.can).toEqual({ edit: true, approve: true, send: false });
    expect(review.body.approvedRevision).toBeNull();
  });

  it('lets only the advisor or lead edit after diagnosis, and only the technician or lead before', async () => {
    const { caseId, tech, advisor, lead } = await diagnosedCase(app, { photo: false });
    const review = await advisor.get(`/api/cases/${caseId}/findings/review`);
    const edit = editOf(review.body.current);
    expect((await tech.put(`/api/cases/${caseId}/findings`).send(edit)).status).toBe(403);
    expect((await tech.get(`/api/cases/${caseId}/findings/review`)).status).toBe(403);
    expect((await advisor.put(`/api/cases/${caseId}/findings`).send(edit)).status).toBe(200);
    const stale = await lead.put(`/api/cases/${caseId}/findings`).send(edit);
    expect(stale.status).toBe(409);
    expect(stale.body.error.message).toMatch(/reload/);
  });

  it('refuses a photo that is not one of the case’s photos', async () => {
    const { caseId, advisor } = await diagnosedCase(app, { photo: false });
    const review = await advisor.get(`/api/cases/${caseId}/findings/review`);
    const res = await advisor
      .put(`/api/cases/${caseId}/findings`)
      .send({ ...editOf(review.body.current), photoIds: [caseId] });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.photoIds).toMatch(/photos attached to this case/);
  });

  it('approves the latest revision only, and a later edit needs approving again', async () => {
    const { caseId, advisor } = await diagnosedCase(app, { photo: false });
    const early = await advisor.get(`/api/cases/${caseId}/findings/export/pdf`);
    expect(early.status).toBe(409);
    expect(early.body.error.message).toMatch(/approve/i);

    await reviewAndEdit(advisor, caseId, null);
    const stale = await advisor.post(`/api/cases/${caseId}/findings/approve`).send({ revision: 1 });
    expect(stale.status).toBe(409);
    expect(stale.body.error.message).toMatch(/not the latest/);
    const approved = await approveLatest(advisor, caseId);
    expect(approved.approvedRevision).toBe(2);
    expect(approved.revisions[0].approvedBy.name).toBeTruthy();
    expect(approved.can).toMatchObject({ approve: false, send: true });

    // An edit after approval is revision 3, not approved; exports still carry revision 2.
    const again = await advisor
      .put(`/api/cases/${caseId}/findings`)
      .send({ ...editOf(approved.current), concern: 'Gauge climbs, coolant smell after stops.' });
    expect(again.status).toBe(200);
    const review = await advisor.get(`/api/cases/${caseId}/findings/review`);
    expect(review.body).toMatchObject({ approvedRevision: 2, current: { revision: 3 } });
    expect(review.body.can.approve).toBe(true);
    const json = await advisor.get(`/api/cases/${caseId}/findings/export/json`);
    expect(json.body.findings.revision).toBe(2);
    expect((await advisor.get(`/api/cases/${caseId}/findings/export/json?revision=3`)).status).toBe(
      409,
    );

    const events = await advisor.get(`/api/cases/${caseId}/events`);
    expect(events.body.events.map((e: { summary: string }) => e.summary)).toContain(
      'Approved the findings for the repair order (revision 2)',
    );
  });

  it('refuses, in the database itself, any change to an approved revision and to any snapshot', async () => {
    const { caseId, advisor } = await diagnosedCase(app, { photo: false });
    await reviewAndEdit(advisor, caseId, null);
    await approveLatest(advisor, caseId);
    const sequelize = testSequelize();
    await expect(
      sequelize.query(
        `UPDATE findings_revisions SET concern = 'changed' WHERE case_id = '${caseId}' AND revision = 2`,
      ),
    ).rejects.toThrow(/approved findings revision 2 cannot be changed/);
    await expect(
      sequelize.query(
        `UPDATE findings_revisions SET approved_at = NULL, approved_by = NULL WHERE case_id = '${caseId}' AND revision = 2`,
      ),
    ).rejects.toThrow(/cannot be changed/);
    await expect(
      sequelize.query(
        `DELETE FROM findings_revisions WHERE case_id = '${caseId}' AND revision = 2`,
      ),
    ).rejects.toThrow(/cannot be deleted/);
    // Revision 1 is not approved, but it is history: its content cannot change either.
    await expect(
      sequelize.query(
        `UPDATE findings_revisions SET cause = 'changed' WHERE case_id = '${caseId}' AND revision = 1`,
      ),
    ).rejects.toThrow(/revision 1 cannot be changed/);
  });
});

describe('exporting an approved repair order', () => {
  it('writes a PDF whose text holds the concern, cause, correction, lines and readings', async () => {
    const { caseId, photoId, advisor, reference, w } = await diagnosedCase(app);
    await reviewAndEdit(advisor, caseId, photoId);
    const approved = await approveLatest(advisor, caseId);
    const findings = approved.current;

    const res = await binary(advisor, `/api/cases/${caseId}/findings/export/pdf`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(res.headers['content-disposition']).toBe(
      `attachment; filename="${reference}-repair-order-r2.pdf"`,
    );
    const bytes = res.body as Buffer;
    expect(bytes.subarray(0, 5).toString()).toBe('%PDF-');
    // Heatpath's font is embedded (subset), not a viewer's substitute.
    expect(bytes.toString('latin1')).toMatch(/\/FontName \/[A-Z]{6}\+IBMPlexSans/);

    const { text, pages } = await pdfText(bytes);
    expect(pages).toBeLessThanOrEqual(2);
    const squash = (s: string) => s.replace(/\s+/g, ' ').trim();
    expect(text).toContain(w.workshop.name);
    expect(text).toContain(reference);
    expect(text).toContain(squash(findings.concern));
    expect(text).toContain(squash(findings.cause.split('\n')[0]));
    expect(text).toContain(squash(findings.correction));
    for (const part of findings.parts) expect(text).toContain(squash(part.description));
    expect(text).toContain('HP-CL-50');
    for (const line of findings.labour) expect(text).toContain(squash(line.operation));
    for (const reading of findings.readings) {
      expect(text).toContain(squash(reading.label));
      expect(text).toContain(reading.display);
    }
    expect(text).toContain('110 °C');
    // The follow-ups keep their cautions, and the standing caution is there.
    expect(text).toMatch(/let it cool, then recheck the level/);
    expect(text).toMatch(/Caution: hot coolant is under pressure/);
    expect(text).toContain('shroud-stuck.png');
  });

  it('writes a CSV that parses back to the same parts and labour lines', async () => {
    const { caseId, advisor, reference } = await diagnosedCase(app, { photo: false });
    await reviewAndEdit(advisor, caseId, null);
    const { current } = await approveLatest(advisor, caseId);
    const res = await advisor.get(`/api/cases/${caseId}/findings/export/csv`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toContain(`${reference}-repair-order-r2.csv`);
    const rows = parse(res.text, { columns: true, skip_empty_lines: true }) as Record<
      string,
      string
    >[];
    expect(Object.keys(rows[0] ?? {})).toEqual([...repairOrderCsvColumns]);
    const parts = rows.filter((r) => r.line_type === 'part');
    const labour = rows.filter((r) => r.line_type === 'labour');
    expect(
      parts.map((r) => ({
        description: r.description,
        quantity: Number(r.quantity),
        partNumber: r.part_number || null,
      })),
    ).toEqual(
      current.parts.map(
        (p: { description: string; quantity: number; partNumber: string | null }) => ({
          description: p.description,
          quantity: p.quantity,
          partNumber: p.partNumber ?? null,
        }),
      ),
    );
    expect(labour.map((r) => ({ operation: r.description, hours: Number(r.hours) }))).toEqual(
      current.labour,
    );
    expect(rows.every((r) => r.case_reference === reference && r.revision === '2')).toBe(true);
  });

  it('writes JSON that validates against the heatpath.repair-order schema, version 1', async () => {
    const { caseId, photoId, advisor, reference } = await diagnosedCase(app);
    await reviewAndEdit(advisor, caseId, photoId);
    await approveLatest(advisor, caseId);
    const res = await advisor.get(`/api/cases/${caseId}/findings/export/json`);
    expect(res.status).toBe(200);
    expect(res.headers['content-disposition']).toContain(`${reference}-repair-order-r2.json`);
    const parsed = repairOrderExportSchema.safeParse(JSON.parse(res.text));
    expect(parsed.success, JSON.stringify(parsed.error?.issues)).toBe(true);
    expect(parsed.data).toMatchObject({
      format: 'heatpath.repair-order',
      version: 1,
      case: { reference },
      findings: { revision: 2, outcome: { nodeId: 'pump-shroud-stuck' } },
      photos: [{ id: photoId, name: 'shroud-stuck.png' }],
    });
    expect(parsed.data?.readings.find((r) => r.display === '110 °C')?.unit).toBe('degC');
  });

  it('is documented: the JSON Schema in docs/repair-order-export.md is the one zod makes', () => {
    const doc = readFileSync(
      join(import.meta.dirname, '../../../../../docs/repair-order-export.md'),
      'utf8',
    );
    const block = /## JSON Schema[\s\S]*?```json\n([\s\S]*?)```/.exec(doc)?.[1];
    expect(block, 'a ```json block under "## JSON Schema"').toBeTruthy();
    expect(JSON.parse(block ?? '')).toEqual(
      z.toJSONSchema(repairOrderExportSchema, { target: 'draft-2020-12' }),
    );
  });

  it('answers 400 for an unknown format', async () => {
    const { caseId, advisor } = await diagnosedCase(app, { photo: false });
    const res = await advisor.get(`/api/cases/${caseId}/findings/export/xlsx`);
    expect(res.status).toBe(400);
  });
});
