// The walk at the car with no Wi-Fi: answers, a reading in psi and photos given offline are kept on
// the tablet (through a reload), shown at once, and stored exactly once, in order, when the
// network returns; a case that moved on meanwhile from another device refuses the stale answers,
// which the screen shows and keeps until the technician chooses.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { apiAs } from './api-client';
import { launch, screenshot, signIn } from './browser';
import type { BrowserSession } from './browser';
import { openOverheatingCase, testPng } from './diagnosed-case';

let session: BrowserSession;
beforeAll(async () => {
  session = await launch();
});
afterAll(async () => {
  await session?.close();
});

type Api = Awaited<ReturnType<typeof apiAs>>;

interface StoredCase {
  walk: {
    currentNodeId: string;
    position: number;
    history: { type: string; nodeId: string; position: number }[];
    path: { nodeId: string }[];
  };
  attachments: { id: string; nodeId: string | null; name: string }[];
  notes: { text: string }[];
}

/** A fresh case on the overheating tree for the demo technician's HL17 KVR, made through the API. */
async function freshCase(tech: Api, complaint: string): Promise<string> {
  return (await openOverheatingCase(tech, complaint, 120_400)).id;
}

async function stepIs(page: Page, title: string) {
  await page
    .getByRole('heading', { level: 2, name: title, exact: true })
    .waitFor({ timeout: 20_000 });
}

async function choose(page: Page, label: string, next: string) {
  await page.getByRole('button', { name: label, exact: true }).click();
  await stepIs(page, next);
}

async function measure(page: Page, readings: Record<string, string>, next: string) {
  for (const [label, value] of Object.entries(readings))
    await page.getByLabel(label, { exact: true }).fill(value);
  await page.getByRole('button', { name: /^Save readings?$/ }).click();
  await stepIs(page, next);
}

async function attachPhoto(
  page: Page,
  name: string,
  band: readonly [number, number, number],
  where: 'Attach photo' | 'Attach file' = 'Attach photo',
) {
  const png = await testPng(session, band);
  await page
    .getByLabel(`${where}: choose the file`)
    .first()
    .setInputFiles({ name, mimeType: 'image/png', buffer: png });
}

/** The page is controlled by the service worker, so a reload with no network still opens it. */
async function waitForOfflineShell(page: Page) {
  // A string, run in the page (this package is compiled without the DOM's types), and polled from
  // here: waitForFunction would evaluate it inside the page, which the app's CSP forbids.
  await expect
    .poll(
      () =>
        page.evaluate(
          "'serviceWorker' in navigator && navigator.serviceWorker.controller !== null",
        ),
      { timeout: 30_000 },
    )
    .toBe(true);
}

async function openCase(page: Page, caseId: string, title: string) {
  await page.goto(`/cases/${caseId}`);
  await stepIs(page, title);
  // The first visit installs the service worker; a second load runs under it.
  await waitForOfflineShell(page);
  await page.reload();
  await stepIs(page, title);
}

describe('the walk without Wi-Fi', () => {
  it('keeps seven answers, a reading in psi and a photo through a reload offline, and stores each once, in order', async () => {
    const tech = await apiAs('tech@harbourlane.test');
    const caseId = await freshCase(tech, 'Runs hot on the motorway; the bay Wi-Fi drops out.');
    const { page, context } = await session.newPage({ width: 800, height: 1280 });
    await signIn(page, 'tech@harbourlane.test');
    await openCase(page, caseId, 'When does it run hot?');

    // Two answers online.
    await choose(page, 'At speed, uphill or towing', 'Coolant level, engine cold');
    await measure(page, { 'Coolant added to reach MAX': '0.2' }, 'Look for leaks');
    await expect
      .poll(async () => (await tech<StoredCase>('GET', `/api/cases/${caseId}`)).walk.history.length)
      .toBe(2);

    await context.setOffline(true);
    await page
      .getByText(/Offline/)
      .first()
      .waitFor();

    // Five answers offline, a photo of the engine bay for the case, and the cap read in psi.
    await attachPhoto(page, 'engine-bay.png', [40, 120, 200], 'Attach file');
    await page.getByText('Waiting to send').first().waitFor();
    await choose(page, 'No sign of a leak', 'Which glycol is in the system?');
    await choose(page, 'Ethylene glycol', 'Coolant concentration (ethylene glycol)');
    await measure(page, { 'Ethylene glycol concentration': '50' }, 'Pressure cap test');
    for (const label of [
      'Cap rating',
      'Pressure at which the cap opened',
      'Pressure the cap still holds after one minute',
    ])
      await page.getByLabel(`Unit for ${label}`).selectOption({ label: 'psi' });
    // 1.4 bar is 20.3 psi (1 psi = 0.0689476 bar, NIST SP 811).
    await measure(
      page,
      {
        'Cap rating': '20.3',
        'Pressure at which the cap opened': '20',
        'Pressure the cap still holds after one minute': '19.6',
      },
      'Cap vacuum valve',
    );
    await choose(
      page,
      'It moves freely and seats; no sign of vacuum',
      'System pressure test (cold)',
    );
    await page.getByText('Waiting to send').first().waitFor();
    await screenshot(page, 'walk-offline-waiting-tablet');

    // A reload with no network: the case opens where the tablet left it, the answers still wait.
    await page.reload();
    await stepIs(page, 'System pressure test (cold)');
    // The unit chosen on an earlier step is still chosen, through the reload.
    expect(await page.getByLabel('Unit for Pressure at the start').inputValue()).toBe('psi');

    // Two more answers.
    await measure(
      page,
      { 'Pressure at the start': '20.3', 'Pressure at the end': '20', 'Time held': '15' },
      'Block test for combustion gas',
    );
    await page.getByRole('button', { name: 'Done', exact: true }).click();
    await stepIs(page, 'Block test result');
    await screenshot(page, 'walk-offline-after-reload-tablet');

    // Nothing has reached the server yet.
    expect((await tech<StoredCase>('GET', `/api/cases/${caseId}`)).walk.history).toHaveLength(2);

    await context.setOffline(false);
    await expect
      .poll(
        async () => (await tech<StoredCase>('GET', `/api/cases/${caseId}`)).walk.history.length,
        { timeout: 60_000 },
      )
      .toBe(9);
    await page.getByText(/saved/i).first().waitFor({ timeout: 30_000 });

    const stored = await tech<StoredCase>('GET', `/api/cases/${caseId}`);
    expect(stored.walk.history.map((e) => e.nodeId)).toEqual([
      'interview-pattern',
      'level-cold',
      'visual-leaks',
      'glycol-type',
      'concentration-eg',
      'cap-test',
      'cap-vacuum-valve',
      'pressure-test',
      'block-test',
    ]);
    expect(stored.walk.history.map((e) => e.position)).toEqual([0, 1, 2, 3, 4, 5, 6, 7, 8]);
    expect(stored.walk.currentNodeId).toBe('block-test-result');
    // The photo was stored once, for the case as a whole.
    expect(stored.attachments.map((a) => [a.name, a.nodeId])).toEqual([['engine-bay.png', null]]);
    const { events } = await tech<{ events: { kind: string }[] }>(
      'GET',
      `/api/cases/${caseId}/events`,
    );
    expect(events.filter((e) => e.kind === 'answer')).toHaveLength(9);

    // The block test's result asks for a photo of the test fluid before it can be answered.
    expect(await page.getByRole('button', { name: 'No change', exact: true }).isDisabled()).toBe(
      true,
    );
    await attachPhoto(page, 'test-fluid.png', [60, 160, 60]);
    await choose(page, 'No change', 'Warm up with live data');
    await expect
      .poll(
        async () => (await tech<StoredCase>('GET', `/api/cases/${caseId}`)).walk.history.length,
        { timeout: 30_000 },
      )
      .toBe(10);

    // A second device reads the same case.
    const other = await session.newPage({ width: 1280, height: 800 });
    await signIn(other.page, 'lead@harbourlane.test');
    await other.page.goto(`/cases/${caseId}`);
    await stepIs(other.page, 'Warm up with live data');
    await other.page.getByText('Pressure cap test').first().waitFor();
    await other.page.getByRole('img', { name: 'engine-bay.png' }).first().waitFor();
    await other.context.close();
    await context.close();
  });

  it('shows the answers a case refused because it moved on from another device, and loses none', async () => {
    const tech = await apiAs('tech@harbourlane.test');
    const caseId = await freshCase(tech, 'Temperature climbs in traffic.');
    const { page, context } = await session.newPage({ width: 800, height: 1280 });
    await signIn(page, 'tech@harbourlane.test');
    await openCase(page, caseId, 'When does it run hot?');

    await context.setOffline(true);
    await choose(page, 'At speed, uphill or towing', 'Coolant level, engine cold');
    await measure(page, { 'Coolant added to reach MAX': '0.35' }, 'Look for leaks');

    // Meanwhile, on another device, the case is answered differently.
    await tech('POST', `/api/cases/${caseId}/walk`, {
      idempotencyKey: crypto.randomUUID(),
      event: {
        type: 'answer.choice',
        nodeId: 'interview-pattern',
        position: 0,
        choiceId: 'idle-or-traffic',
      },
    });

    await context.setOffline(false);
    const held = page.getByRole('region', { name: /not stored|moved on/i });
    await held.waitFor({ timeout: 60_000 });
    // What was typed is on screen: the answer and the reading.
    await held.getByText(/At speed, uphill or towing/).waitFor();
    await held.getByText(/0\.35/).first().waitFor();
    await screenshot(page, 'walk-offline-moved-on-tablet');

    // The server kept the other device's answer once and none of the stale ones.
    const mid = await tech<StoredCase>('GET', `/api/cases/${caseId}`);
    expect(mid.walk.history).toHaveLength(1);
    expect(mid.walk.history[0]?.nodeId).toBe('interview-pattern');

    // Keeping the case as it is writes the refused answers into a note: nothing typed is lost.
    await held.getByRole('button', { name: 'Keep the case as it is' }).click();
    await expect
      .poll(async () => (await tech<StoredCase>('GET', `/api/cases/${caseId}`)).notes.length, {
        timeout: 30_000,
      })
      .toBe(1);
    const after = await tech<StoredCase>('GET', `/api/cases/${caseId}`);
    expect(after.walk.history).toHaveLength(1);
    expect(after.notes[0]?.text).toMatch(/At speed, uphill or towing/);
    expect(after.notes[0]?.text).toMatch(/0\.35/);
    await context.close();
  });
});
