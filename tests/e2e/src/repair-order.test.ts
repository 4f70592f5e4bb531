// The repair order in a real browser: the technician's diagnosed case is made through the API
// (the scripted stuck-shroud walk, with a photo); the service advisor opens it from Findings and
// the case page, edits a line, approves, downloads the PDF and e-mails it to the customer; the lead's outbox
// shows it delivered to the mail server (the SMTP fake scripts/test.mjs starts).
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launch, screenshot, signIn } from './browser';
import { diagnosedCase } from './diagnosed-case';
import type { BrowserSession } from './browser';

let session: BrowserSession;
beforeAll(async () => {
  session = await launch();
});
afterAll(async () => {
  await session?.close();
});

describe('repair order', () => {
  it('the advisor edits a line, approves, downloads the PDF and sends it; the outbox shows it delivered', async () => {
    const { caseId, reference } = await diagnosedCase({
      session,
      complaint: 'Temperature gauge climbs on long motorway climbs; fan runs on after stopping.',
      mileageAtIntake: 118400,
      photos: [{ name: 'shroud-stuck-out.png', band: [11, 90, 81] }],
    });

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
