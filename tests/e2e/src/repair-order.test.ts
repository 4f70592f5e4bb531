// The repair order in a real browser: the technician's diagnosed case is made through the API
// (the scripted stuck-shroud walk, with a photo); the service advisor opens it from Findings and
// the case page, edits a line, approves, downloads the PDF and e-mails it to the customer; the lead's outbox
// shows it delivered to the mail server (the SMTP fake scripts/test.mjs starts).
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { deflateSync } from 'node:zlib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { stuckShroudPath } from '../../../apps/api/src/test/walks';
import { launch, screenshot, signIn } from './browser';
import { apiAs } from './api-client';
import type { BrowserSession } from './browser';

let session: BrowserSession;
beforeAll(async () => {
  session = await launch();
});
afterAll(async () => {
  await session?.close();
});

// A small invented photo (a grey frame with a teal band), written as a PNG by hand so the test
// needs no image library.
function crc32(bytes: Buffer): number {
  let crc = 0xffffffff;
  for (const byte of bytes) {
    crc ^= byte;
    for (let k = 0; k < 8; k += 1) crc = crc & 1 ? (crc >>> 1) ^ 0xedb88320 : crc >>> 1;
  }
  return (crc ^ 0xffffffff) >>> 0;
}
function testPng(width = 320, height = 240): Buffer {
  const chunk = (type: string, data: Buffer) => {
    const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
    const out = Buffer.alloc(body.length + 8);
    out.writeUInt32BE(data.length, 0);
    body.copy(out, 4);
    out.writeUInt32BE(crc32(body), body.length + 4);
    return out;
  };
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header.set([8, 2, 0, 0, 0], 8);
  const rows = Buffer.alloc((width * 3 + 1) * height);
  for (let y = 0; y < height; y += 1) {
    const band = y > height * 0.4 && y < height * 0.6;
    for (let x = 0; x < width; x += 1) {
      const at = y * (width * 3 + 1) + 1 + x * 3;
      rows.set(band ? [11, 90, 81] : [120, 124, 128], at);
    }
  }
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', header),
    chunk('IDAT', deflateSync(rows)),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

/** The technician's case for HL17 KVR, walked to the stuck-shroud outcome and diagnosed. */
async function diagnosedCase(): Promise<{ caseId: string; reference: string }> {
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
    complaint: 'Temperature gauge climbs on long motorway climbs; fan runs on after stopping.',
    mileageAtIntake: 118400,
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
  const form = new FormData();
  form.set('nodeId', 'shroud-inspection');
  form.set(
    'file',
    new Blob([new Uint8Array(testPng())], { type: 'image/png' }),
    'shroud-stuck-out.png',
  );
  await tech('POST', `/api/cases/${kase.id}/attachments`, form);
  await tech('POST', `/api/cases/${kase.id}/diagnosed`);
  return { caseId: kase.id, reference: kase.reference };
}

describe('repair order', () => {
  it('the advisor edits a line, approves, downloads the PDF and sends it; the outbox shows it delivered', async () => {
    const { caseId, reference } = await diagnosedCase();

    const { page, context } = await session.newPage({ width: 1024, height: 768 });
    await signIn(page, 'advisor@harbourlane.test');
    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'Findings' })
      .click();
    await page.locator(`a[href="/cases/${caseId}"]`).click();
    await page.getByRole('link', { name: /Open the repair order/ }).click();
    await page.getByRole('heading', { level: 1, name: /Repair order · HL17 KVR/ }).waitFor();
    const form = page.getByRole('form', { name: 'Findings for the repair order' });
    await form.waitFor();

    // Edit a line: the coolant quantity, and a part number the workshop fills in.
    await form.getByLabel('Quantity of part 3').fill('5.5');
    await form.getByLabel('Part number of part 1').fill('CV-WP-1408');
    await form.getByLabel('shroud-stuck-out.png').check();
    await form.getByRole('button', { name: 'Save revision 2' }).click();
    const approve = page.getByRole('button', { name: /Approve revision 2/ });
    await approve.waitFor();
    const history = page.getByRole('region', { name: 'History' });
    await history.getByText(/Part changed: Coolant .* × 6 → .* × 5\.5/).waitFor();
    await history.getByText('Photos chosen: 1 for the repair order').waitFor();
    await approve.click();
    await page.getByText('Revision 2 approved').waitFor();
    await screenshot(page, 'repair-order-approved-tablet');

    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('link', { name: /Download PDF/ }).click(),
    ]);
    expect(download.suggestedFilename()).toBe(`${reference}-repair-order-r2.pdf`);
    const pdf = readFileSync(await download.path());
    // Kept beside the screenshots, so the PDF a customer gets can be looked at after a run.
    const artifacts =
      process.env.E2E_ARTIFACTS ?? join(process.cwd(), 'test-results', 'screenshots');
    mkdirSync(artifacts, { recursive: true });
    writeFileSync(join(artifacts, 'repair-order.pdf'), pdf);
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    expect(pdf.length).toBeGreaterThan(20_000);

    const send = page.getByRole('form', { name: 'Send the repair order' });
    await send.getByRole('radio', { name: /Customer/ }).check();
    await send
      .getByLabel('A line of your own (optional)')
      .fill('The part is on order for Thursday.');
    await send.getByRole('button', { name: 'Send repair order' }).click();
    await page.getByText('In the outbox').waitFor();
    const sent = page.getByRole('list', { name: 'Sent repair orders' });
    await sent.getByText('Delivered to the mail server').waitFor({ timeout: 20_000 });
    expect(await sent.getByText('morwenna.tregarth@example.test').count()).toBe(1);
    await screenshot(page, 'repair-order-sent-tablet');
    await context.close();

    const phone = await session.newPage({ width: 390, height: 844 });
    await signIn(phone.page, 'advisor@harbourlane.test');
    await phone.page.goto(`/cases/${caseId}/repair-order`);
    await phone.page.getByText('Revision 2 approved').waitFor();
    await screenshot(phone.page, 'repair-order-phone');
    await phone.context.close();

    const lead = await session.newPage({ width: 1024, height: 768 });
    await signIn(lead.page, 'lead@harbourlane.test');
    await lead.page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'Outbox' })
      .click();
    const message = lead.page.getByRole('article', {
      name: new RegExp(`Repair order ${reference}`),
    });
    await message.waitFor();
    await message.getByText('Delivered to the mail server').waitFor();
    await message.getByText(`${reference}-repair-order-r2.pdf`).waitFor();
    await message.getByText('The part is on order for Thursday.').waitFor();
    await screenshot(lead.page, 'outbox-lead');
    await lead.context.close();
  });
});
