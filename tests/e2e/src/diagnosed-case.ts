// A finished case set up through the API for browser tests: the technician's case for HL17 KVR
// walked along the scripted stuck-shroud path, with invented photos (drawn and captured by
// chromium) and notes on the shroud step, then marked diagnosed.
import { stuckShroudPath } from '../../../apps/api/src/test/walks';
import { apiAs } from './api-client';
import type { BrowserSession } from './browser';

export interface CasePhoto {
  name: string;
  /** The colour of the band across the grey frame. */
  band: readonly [number, number, number];
}

/** A small invented photo: a grey frame with a coloured band. */
export async function testPng(session: BrowserSession, band: CasePhoto['band']): Promise<Buffer> {
  const { page, context } = await session.newPage({ width: 320, height: 240 });
  await page.setContent(
    `<body style="margin:0;height:240px;display:flex;align-items:center;background:rgb(120,124,128)">` +
      `<div style="width:100%;height:48px;background:rgb(${band.join(',')})"></div></body>`,
  );
  const png = await page.screenshot();
  await context.close();
  return png;
}

export async function diagnosedCase(options: {
  session: BrowserSession;
  complaint: string;
  mileageAtIntake: number;
  photos: readonly CasePhoto[];
  notes?: readonly string[];
  /** Words the technician adds to the finding's correction before marking the case diagnosed. */
  correctionAddition?: string;
}): Promise<{ caseId: string; reference: string }> {
  const tech = await apiAs('tech@harbourlane.test');
  const { vehicles } = await tech<{ vehicles: { id: string }[] }>('GET', '/api/vehicles?q=HL17');
  const { trees } = await tech<{ trees: { id: string; key: string }[] }>(
    'GET',
    '/api/trees/available',
  );
  const tree = trees.find((t) => t.key === 'overheats-intermittent-no-codes');
  if (!vehicles[0] || !tree) throw new Error('the demo seed has no HL17 KVR or overheating tree');
  const kase = await tech<{ id: string; reference: string }>('POST', '/api/cases', {
    vehicleId: vehicles[0].id,
    complaint: options.complaint,
    mileageAtIntake: options.mileageAtIntake,
    treeId: tree.id,
  });
  let position = 0;
  for (const step of stuckShroudPath) {
    const res = await tech<{ walk: { position: number } }>('POST', `/api/cases/${kase.id}/walk`, {
      idempotencyKey: crypto.randomUUID(),
      event: { ...step.answer, nodeId: step.nodeId, position },
    });
    position = res.walk.position;
  }
  for (const photo of options.photos) {
    const form = new FormData();
    form.set('nodeId', 'shroud-inspection');
    const png = await testPng(options.session, photo.band);
    form.set('file', new Blob([new Uint8Array(png)], { type: 'image/png' }), photo.name);
    await tech('POST', `/api/cases/${kase.id}/attachments`, form);
  }
  for (const text of options.notes ?? []) {
    await tech('POST', `/api/cases/${kase.id}/notes`, {
      text,
      nodeId: 'shroud-inspection',
      idempotencyKey: crypto.randomUUID(),
    });
  }
  if (options.correctionAddition) {
    const { findings } = await tech<{ findings: Record<string, unknown> & { correction: string } }>(
      'GET',
      `/api/cases/${kase.id}`,
    );
    await tech('PUT', `/api/cases/${kase.id}/findings`, {
      revision: findings.revision,
      concern: findings.concern,
      cause: findings.cause,
      correction: `${findings.correction} ${options.correctionAddition}`,
      parts: findings.parts,
      labour: findings.labour,
      followUps: findings.followUps,
    });
  }
  await tech('POST', `/api/cases/${kase.id}/diagnosed`);
  return { caseId: kase.id, reference: kase.reference };
}
