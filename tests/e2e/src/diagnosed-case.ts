// A finished case set up through the API for browser tests: the technician's case for HL17 KVR
// walked along the scripted stuck-shroud path (a photo attached first where a step requires one,
// as the pump removal does), with invented photos (drawn and captured by chromium) and notes on
// the shroud step, then marked diagnosed.
import type { TreeNode } from '@heatpath/fault-tree';
import { stuckShroudPath } from '../../../apps/api/src/db/seeders/demo-walks';
import { apiAs, attachFile } from './api-client';
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

interface Walked {
  walk: { position: number; currentNode: TreeNode & { id: string } };
}

/** Where a step requires a photo or log, attaches an invented one to it first. */
async function attachRequiredEvidence(
  tech: Awaited<ReturnType<typeof apiAs>>,
  caseId: string,
  node: Walked['walk']['currentNode'],
  session: BrowserSession,
): Promise<void> {
  if (node.kind === 'outcome') return;
  for (const request of node.evidence.filter((r) => r.required)) {
    await attachFile(
      tech,
      caseId,
      request.kind === 'photo'
        ? {
            nodeId: node.id,
            name: `${node.id}.png`,
            type: 'image/png',
            bytes: await testPng(session, [40, 44, 48]),
          }
        : {
            nodeId: node.id,
            name: `${node.id}.csv`,
            type: 'text/csv',
            bytes: Buffer.from('time_s,coolant_c\n0,21\n300,62\n600,88\n'),
          },
    );
  }
}

type Api = Awaited<ReturnType<typeof apiAs>>;

/** A new case on the overheating tree for the demo's HL17 KVR, opened through the API. */
export async function openOverheatingCase(
  api: Api,
  complaint: string,
  mileageAtIntake: number,
): Promise<{ id: string; reference: string } & Walked> {
  const { vehicles } = await api<{ vehicles: { id: string }[] }>('GET', '/api/vehicles?q=HL17');
  const { trees } = await api<{ trees: { id: string; key: string }[] }>(
    'GET',
    '/api/trees/available',
  );
  const tree = trees.find((t) => t.key === 'overheats-intermittent-no-codes');
  if (!vehicles[0] || !tree) throw new Error('the demo seed has no HL17 KVR or overheating tree');
  return api<{ id: string; reference: string } & Walked>('POST', '/api/cases', {
    vehicleId: vehicles[0].id,
    complaint,
    mileageAtIntake,
    treeId: tree.id,
  });
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
  const kase = await openOverheatingCase(tech, options.complaint, options.mileageAtIntake);
  let { walk } = kase;
  for (const step of stuckShroudPath) {
    await attachRequiredEvidence(tech, kase.id, walk.currentNode, options.session);
    const res = await tech<Walked>('POST', `/api/cases/${kase.id}/walk`, {
      idempotencyKey: crypto.randomUUID(),
      event: { ...step.answer, nodeId: step.nodeId, position: walk.position },
    });
    walk = res.walk;
  }
  for (const photo of options.photos) {
    const png = await testPng(options.session, photo.band);
    await attachFile(tech, kase.id, {
      nodeId: 'shroud-inspection',
      name: photo.name,
      type: 'image/png',
      bytes: png,
    });
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
