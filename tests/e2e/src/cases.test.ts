// The technician's job in a real browser: add a vehicle, open a case, walk the overheating tree
// to the stuck-shroud finding — one step in °F, a photo uploaded, a reload mid-walk — edit and
// save the findings, mark the case diagnosed; then the advisor sees the findings.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { launch, screenshot, signIn } from './browser';
import type { BrowserSession } from './browser';
import { diagnosedCase } from './diagnosed-case';

let session: BrowserSession;
beforeAll(async () => {
  session = await launch();
});
afterAll(async () => {
  await session?.close();
});

const plate = `E2E ${Date.now().toString(36).slice(-5).toUpperCase()}`;
let caseUrl = '';

async function stepIs(page: Page, title: string) {
  await page.getByRole('heading', { level: 2, name: title }).waitFor({ timeout: 15_000 });
}

async function choose(page: Page, label: string, next: string) {
  await page.getByRole('button', { name: label, exact: true }).click();
  await stepIs(page, next);
}

async function measure(page: Page, readings: Record<string, string>, next: string, unit?: string) {
  if (unit)
    for (const label of Object.keys(readings))
      await page.getByLabel(`Unit for ${label}`).selectOption({ label: unit });
  for (const [label, value] of Object.entries(readings))
    await page.getByLabel(label, { exact: true }).fill(value);
  await page.getByRole('button', { name: /^Save readings?$/ }).click();
  await stepIs(page, next);
}

async function done(page: Page, next: string) {
  await page.getByRole('button', { name: 'Done', exact: true }).click();
  await stepIs(page, next);
}

describe('guided diagnosis', () => {
  it('a technician walks a new case to a finding and saves it', async () => {
    const { page, context } = await session.newPage({ width: 1280, height: 800 });
    await signIn(page, 'tech@harbourlane.test');
    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: /My cases/ })
      .click();
    await page.getByRole('link', { name: 'New case' }).click();

    await page.getByRole('button', { name: 'Add vehicle' }).click();
    await page.getByLabel('Registration plate').fill(plate);
    await page.getByLabel('Make').fill('Brisa');
    await page.getByLabel('Model', { exact: true }).fill('Orlo Estate 2.0d');
    await page.getByRole('button', { name: 'Save vehicle' }).click();
    await page.getByRole('button', { name: 'New customer' }).click();
    await page.getByLabel('Customer name').fill('Tamsin Hocking');
    await page
      .getByLabel('Complaint in the customer’s words')
      .fill('Temperature needle climbs when towing uphill, then drops back.');
    await page.getByLabel('Mileage at intake').fill('164950');
    await page.getByRole('radio', { name: /Overheats now and then/ }).check();
    await screenshot(page, 'case-new-tablet');
    await page.getByRole('button', { name: 'Create case' }).click();
    await stepIs(page, 'When does it run hot?');
    caseUrl = page.url();
    expect(caseUrl).toMatch(/\/cases\/[0-9a-f-]{36}$/);

    await choose(page, 'At speed, uphill or towing', 'Coolant level, engine cold');
    await measure(page, { 'Coolant added to reach MAX': '0.2' }, 'Look for leaks');
    await choose(page, 'No sign of a leak', 'Which glycol is in the system?');
    await choose(page, 'Ethylene glycol', 'Coolant concentration (ethylene glycol)');
    await measure(page, { 'Ethylene glycol concentration': '50' }, 'Pressure cap test');
    await measure(
      page,
      {
        'Cap rating': '1.4',
        'Pressure at which the cap opened': '1.38',
        'Pressure the cap still holds after one minute': '1.35',
      },
      'Cap vacuum valve',
    );
    await choose(
      page,
      'It moves freely and seats; no sign of vacuum',
      'System pressure test (cold)',
    );
    await measure(
      page,
      { 'Pressure at the start': '1.4', 'Pressure at the end': '1.38', 'Time held': '15' },
      'Block test for combustion gas',
    );
    await screenshot(page, 'case-procedure-cautions-tablet');
    await done(page, 'Block test result');

    // The step asks for a photo of the test fluid: attach one (a real PNG made by the browser).
    const png = await page.screenshot({ clip: { x: 0, y: 0, width: 320, height: 240 } });
    await page
      .getByLabel('Attach photo: choose the file')
      .first()
      .setInputFiles({ name: 'test-fluid.png', mimeType: 'image/png', buffer: png });
    await page.locator('img[src*="/thumbnail"]').first().waitFor({ timeout: 15_000 });
    await choose(page, 'No change', 'Warm up with live data');

    // Live data read in °F: 230 °F is 110 °C, 222.8 °F is 106 °C.
    await measure(
      page,
      { 'Coolant temperature in live data': '230', 'IR reading at the sensor housing': '222.8' },
      'Radiator hose temperatures',
      '°F',
    );
    // The unit chosen a step ago stays chosen (and is the technician's preference now);
    // these readings were taken in °C, so the technician switches back.
    const hoseLabels = [
      'Live data at the moment of the hose readings',
      'Radiator inlet hose',
      'Radiator outlet hose',
    ];
    expect(
      await page.getByLabel(`Unit for ${hoseLabels[0]}`).locator('option:checked').textContent(),
    ).toBe('°F');
    for (const label of hoseLabels)
      await page.getByLabel(`Unit for ${label}`).selectOption({ label: '°C' });
    // Read at the same moment as live data, with the thermostat known to be open.
    await page
      .getByLabel('Live data at the moment of the hose readings', { exact: true })
      .fill('110');
    await page.getByLabel('Radiator inlet hose', { exact: true }).fill('52');
    await page.getByLabel('Radiator outlet hose', { exact: true }).fill('45');
    // The drop across the radiator is worked out as it is typed: 52 − 45 = 7 K.
    await page
      .getByRole('region', { name: 'Worked out as you type' })
      .getByText(/7(\.0)? K/)
      .first()
      .waitFor();
    await screenshot(page, 'case-measurement-live-values-tablet');
    await page.getByRole('button', { name: /^Save readings?$/ }).click();
    await stepIs(page, 'Does coolant move through the engine?');

    // Reload mid-walk: the case is exactly where it was.
    await page.reload();
    await stepIs(page, 'Does coolant move through the engine?');
    await choose(
      page,
      'It moves: heater hoses hot, good cabin heat, only the radiator side cool',
      'Take the thermostat out and test it',
    );
    await done(page, 'Did the thermostat open?');
    await choose(page, 'Yes, it began to open', 'Thermostat opening temperature');
    await measure(
      page,
      { 'Stamped opening temperature': '87', 'Water temperature when it began to open': '88' },
      'Did it open fully?',
    );
    await choose(page, 'Yes, it opened fully', 'Refill and bleed the main loop');
    await done(page, 'Does coolant flow now?');
    await choose(
      page,
      'No: the engine gets hot and the inlet hose still stays cool',
      'Which coolant pump?',
    );
    await choose(
      page,
      'Switchable: a shroud over the impeller, worked by a control valve',
      'Switchable pump: control valve and wiring',
    );
    await choose(
      page,
      'Supply, wiring, connector and winding as the maker gives; not held powered',
      'Switchable pump: command it from the scan tool',
    );
    await choose(
      page,
      'Nothing changes whatever the command: the inlet stays cool, the engine climbs',
      'Remove the coolant pump for inspection',
    );
    // The step asks for photos of the pump as required evidence: Done waits for one.
    expect(await page.getByRole('button', { name: 'Done', exact: true }).isDisabled()).toBe(true);
    await page
      .getByLabel('Attach photo: choose the file')
      .first()
      .setInputFiles({ name: 'pump-impeller.png', mimeType: 'image/png', buffer: png });
    await page
      .getByRole('button', { name: 'Done', exact: true })
      .and(page.locator(':enabled'))
      .waitFor();
    await done(page, 'Inspect the pump shroud');
    await page
      .getByRole('button', { name: 'Yes, the shroud is stuck over the impeller', exact: true })
      .click();
    await page.getByText('Switchable pump shroud stuck over the impeller').first().waitFor();

    const correction = page.getByLabel('Correction', { exact: true });
    await correction.fill(`${await correction.inputValue()} Customer approved the work by phone.`);
    await page.getByRole('button', { name: 'Save findings' }).click();
    await page.getByText(/Saved at/).waitFor();
    await screenshot(page, 'case-findings-tablet');
    await page.getByRole('button', { name: 'Mark diagnosed' }).click();
    await page.getByText('Diagnosed').first().waitFor();
    await context.close();
  });

  it('the advisor sees the diagnosed case and its findings, read-only', async () => {
    // Its own diagnosed case, made through the API, so this test needs no other to have run.
    const { caseId } = await diagnosedCase({
      session,
      complaint: 'Runs hot in slow traffic; the fan seems to run all the time.',
      mileageAtIntake: 96_200,
      photos: [],
      correctionAddition: 'Customer approved the work by phone.',
    });
    const { page, context } = await session.newPage({ width: 1024, height: 768 });
    await signIn(page, 'advisor@harbourlane.test');
    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: /Findings/ })
      .click();
    await page.locator(`a[href="/cases/${caseId}"]`).first().click();
    await page.getByText('Customer approved the work by phone.').first().waitFor();
    expect(await page.getByRole('button', { name: 'Save findings' }).count()).toBe(0);
    await screenshot(page, 'case-advisor-findings-tablet');
    await context.close();
  });
});
