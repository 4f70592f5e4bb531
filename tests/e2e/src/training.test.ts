// The training casebook in a real browser. A finished case of the overheating tree (the scripted
// stuck-shroud walk, with two photos) is made through the API so the test knows exactly which case
// it marks. The lead marks it for training with a teaching note and one photo hidden, and puts it
// in a course for every apprentice; the apprentice opens the Casebook, predicts through every
// step to the score; the lead sees the reviewed case and the score under Progress and signs the
// course off. Screenshots at each stage, on a 1280×800 screen and an 800×1280 tablet.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
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

const desktop = { width: 1280, height: 800 };
const tablet = { width: 800, height: 1280 };
const stamp = Date.now().toString(36).slice(-5).toUpperCase();
const courseTitle = `First month on the cooling system ${stamp}`;
const teachingNote =
  'A hot radiator inlet with a cold outlet means the coolant is not moving: look at the pump before the thermostat.';

async function nav(page: Page, name: string) {
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name }).click();
}

describe('training casebook', () => {
  it('the lead marks a case and builds a course; the apprentice predicts through it; the lead signs off', async () => {
    const { reference } = await diagnosedCase({
      session,
      complaint: 'Gauge climbs on long climbs with a trailer; no warning light, no stored codes.',
      mileageAtIntake: 121900,
      photos: [
        { name: 'shroud-stuck-out.png', band: [11, 90, 81] },
        { name: 'engine-bay-wide.png', band: [160, 96, 20] },
      ],
      notes: ['Shroud stays out with the engine hot; pump body dry.'],
    });

    // ---- The lead marks the case for training ----
    const lead = await session.newPage(desktop);
    await signIn(lead.page, 'lead@harbourlane.test');
    await nav(lead.page, 'Training');
    await lead.page.getByRole('heading', { level: 1, name: 'Training' }).waitFor();
    const mark = lead.page.getByRole('form', { name: 'Mark a finished case for training' });
    await mark.getByText('never reach an apprentice', { exact: false }).waitFor();
    // The seed's own finished cases are candidates too; this test marks the one it made.
    const candidate = mark.getByRole('radio', { name: new RegExp(`^${reference}: `) });
    await candidate.check();
    await mark.getByText('Shroud stays out with the engine hot; pump body dry.').waitFor();
    await mark.getByLabel('Teaching note').fill(teachingNote);
    await mark.getByRole('radio', { name: /Practised/ }).check();
    await mark.getByRole('checkbox', { name: 'Hide this photo: engine-bay-wide.png' }).check();
    await mark.locator('img').first().waitFor();
    await screenshot(lead.page, 'training-mark-case-desktop');
    await mark.getByRole('button', { name: 'Mark for training' }).click();
    await lead.page.getByText(`${reference} (“`, { exact: false }).waitFor();
    const marked = lead.page
      .getByRole('list', { name: 'Training cases' })
      .getByRole('article', { name: new RegExp(reference) });
    await marked.getByText('1 photo hidden', { exact: false }).waitFor();
    await marked.scrollIntoViewIfNeeded();
    await screenshot(lead.page, 'training-cases-desktop');

    // ---- …and puts it in a course for every apprentice ----
    await lead.page
      .getByRole('navigation', { name: 'Training sections' })
      .getByRole('link', { name: 'Courses' })
      .click();
    await lead.page.getByRole('button', { name: 'New course' }).click();
    const course = lead.page.getByRole('form', { name: 'New course' });
    await course.getByLabel('Course title').fill(courseTitle);
    await course
      .getByLabel('Description (optional)')
      .fill('Real overheating cases from this workshop, easiest first.');
    await course.getByLabel('For').selectOption({ label: 'Every apprentice' });
    const toAdd = course.getByLabel('Training case to add');
    const option = toAdd.locator('option', { hasText: reference });
    await toAdd.selectOption((await option.getAttribute('value')) ?? '');
    await course.getByRole('button', { name: 'Add to the course' }).click();
    await course
      .getByRole('list', { name: 'Cases in the course' })
      .getByText(reference, { exact: false })
      .waitFor();
    await screenshot(lead.page, 'training-course-form-desktop');
    await course.getByRole('button', { name: 'Create course' }).click();
    await lead.page.getByRole('article', { name: courseTitle }).waitFor();
    await lead.context.close();

    // ---- The apprentice predicts through the case on a tablet ----
    const learner = await session.newPage(tablet);
    const page = learner.page;
    await signIn(page, 'apprentice@harbourlane.test');
    await nav(page, 'Casebook');
    const courseRegion = page.getByRole('region', { name: courseTitle });
    await courseRegion.waitFor();
    await screenshot(page, 'casebook-tablet');
    await courseRegion.getByRole('link', { name: /Overheats now and then/ }).click();
    await page.getByRole('heading', { name: 'Predict, then see' }).waitFor();
    // The case page shows no plate, VIN or customer, only the car's make and model.
    expect(await page.getByText('HL17 KVR').count()).toBe(0);
    await screenshot(page, 'casebook-case-tablet');
    await page.getByRole('button', { name: /^Predict, then see/ }).click();
    await page.waitForURL(/\/casebook\/attempts\//);

    const score = page.getByRole('region', { name: 'Your score' });
    // The current step's title and "Step n · kind" line, or null between screens.
    const stepKey = async () => {
      try {
        const heading = page.locator('#current-step-heading');
        const line = page.locator('#current-step-heading + p');
        return `${await heading.textContent({ timeout: 500 })}|${await line.textContent({ timeout: 500 })}`;
      } catch {
        return null;
      }
    };
    let predictions = 0;
    for (let guard = 0; guard < 60; guard += 1) {
      const form = page.getByRole('form', { name: /Your prediction/ });
      await score.or(form).first().waitFor();
      if (await score.isVisible()) break;
      const before = await stepKey();
      if (predictions === 0) await screenshot(page, 'training-predict-step-tablet');
      await form.getByRole('radio').first().check();
      await form.getByRole('button', { name: 'See what happened' }).click();
      predictions += 1;
      // Either the score is up, or the current step has moved on.
      await expect
        .poll(
          async () => {
            if (await score.isVisible()) return true;
            const now = await stepKey();
            return now !== null && now !== before;
          },
          { timeout: 15_000 },
        )
        .toBe(true);
      if (predictions === 1) {
        await page.getByRole('region', { name: /^What really happened: / }).waitFor();
        await screenshot(page, 'training-predict-reveal-tablet');
      }
    }
    expect(predictions).toBeGreaterThan(0);
    const scoreText = (await score.getByTestId('attempt-score').textContent()) ?? '';
    expect(scoreText).toMatch(/^\d+ \/ \d+$/);
    await page.getByText(teachingNote).waitFor();
    await screenshot(page, 'training-score-tablet');
    await learner.context.close();

    // The same attempt on the wide screen, and the replay.
    const wide = await session.newPage(desktop);
    await signIn(wide.page, 'apprentice@harbourlane.test');
    await wide.page.goto('/casebook/progress');
    await wide.page.getByRole('list', { name: 'Your attempts' }).getByText(scoreText).waitFor();
    await screenshot(wide.page, 'casebook-my-progress-desktop');
    await wide.page.getByRole('list', { name: 'Your attempts' }).getByRole('link').first().click();
    await wide.page.getByRole('region', { name: 'Your score' }).waitFor();
    await screenshot(wide.page, 'training-score-desktop');
    await wide.page.getByRole('link', { name: 'Replay as it happened' }).click();
    await wide.page
      .getByTestId('replay-position')
      .getByText(/^Step 1 of \d+$/)
      .waitFor();
    await wide.page.getByRole('button', { name: 'Next', exact: true }).click();
    await wide.page
      .getByTestId('replay-position')
      .getByText(/^Step 2 of/)
      .waitFor();
    await screenshot(wide.page, 'training-replay-desktop');
    await wide.context.close();

    // ---- The lead reads the progress and signs the course off ----
    const again = await session.newPage(desktop);
    await signIn(again.page, 'lead@harbourlane.test');
    await nav(again.page, 'Training');
    await again.page
      .getByRole('navigation', { name: 'Training sections' })
      .getByRole('link', { name: 'Progress' })
      .click();
    const kit = again.page.getByRole('article', { name: 'Kit Marrow' });
    await kit.waitFor();
    const reviewed = Number(
      await kit
        .locator('dt', { hasText: 'Cases reviewed' })
        .locator('xpath=following-sibling::dd[1]')
        .textContent(),
    );
    expect(reviewed).toBeGreaterThanOrEqual(1);
    await kit.getByRole('button', { name: /Every attempt/ }).click();
    await screenshot(again.page, 'training-progress-desktop');
    await kit
      .getByRole('list', { name: 'Attempts of Kit Marrow' })
      .getByText(scoreText)
      .first()
      .waitFor();
    await kit.getByRole('button', { name: `Sign off as complete: ${courseTitle}` }).click();
    await kit.getByLabel('Note for the record (optional)').fill('Talked it through at the car.');
    await screenshot(again.page, 'training-progress-sign-off-desktop');
    await kit.getByRole('button', { name: /^Yes, sign off/ }).click();
    await kit
      .getByText(/Signed off .* by Rosa Penhallow/)
      .first()
      .waitFor();
    await screenshot(again.page, 'training-progress-signed-desktop');
    await again.context.close();

    const portrait = await session.newPage(tablet);
    await signIn(portrait.page, 'lead@harbourlane.test');
    await portrait.page.goto('/training/progress');
    await portrait.page.getByRole('article', { name: 'Kit Marrow' }).waitFor();
    await screenshot(portrait.page, 'training-progress-tablet');
    await portrait.page.goto('/training');
    await portrait.page.getByRole('list', { name: 'Training cases' }).waitFor();
    await screenshot(portrait.page, 'training-cases-tablet');
    await portrait.context.close();
  });
});
