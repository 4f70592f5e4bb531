// Tree authoring in a real browser: the lead starts a draft of a shipped tree, adds a measurement
// step with a formula branch, sees the branch that leads nowhere marked on the graph, fixes it by
// connecting the branch and the step, tries the draft, and publishes version 2 — while a case
// opened on version 1 stays on version 1.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launch, screenshot, signIn } from './browser';
import type { BrowserSession } from './browser';
import type { Page } from 'playwright-core';

let session: BrowserSession;
beforeAll(async () => {
  session = await launch();
});
afterAll(async () => {
  await session?.close();
});

const treeTitle = 'Overheats now and then, no fault codes stored';
const client = { 'X-Heatpath-Client': 'web' };

/** A full-page screenshot from the top, so the sticky graph column is drawn where it starts. */
async function shot(page: Page, name: string): Promise<void> {
  await page.evaluate('window.scrollTo(0, 0)');
  await screenshot(page, name);
}

describe('tree authoring', () => {
  it('the lead edits, checks, tries and publishes version 2; a version-1 case keeps version 1', async () => {
    const { page, context } = await session.newPage({ width: 1280, height: 800 });
    await signIn(page, 'lead@harbourlane.test');

    // A case opened now is pinned to version 1.
    const trees = (await (await page.request.get('/api/trees/available')).json()) as {
      trees: { id: string; title: string }[];
    };
    const tree = trees.trees.find((t) => t.title === treeTitle)!;
    const vehicles = (await (await page.request.get('/api/vehicles?q=HL17')).json()) as {
      vehicles: { id: string }[];
    };
    const opened = await page.request.post('/api/cases', {
      headers: client,
      data: {
        vehicleId: vehicles.vehicles[0]!.id,
        complaint: 'Runs hot in traffic',
        treeId: tree.id,
      },
    });
    expect(opened.status()).toBe(201);
    const caseId = ((await opened.json()) as { id: string; tree: { version: number } }).id;

    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: /Decision trees/ })
      .click();
    await page
      .getByRole('button', { name: `Start a draft of ${treeTitle}` })
      .or(page.getByRole('link', { name: `Start a draft of ${treeTitle}` }))
      .first()
      .click();
    const graph = page.getByRole('region', { name: 'Tree graph' });
    await graph.waitFor({ timeout: 30_000 });
    await page.getByText('The draft is complete').waitFor();

    // A new measurement step: the heater hoses after a refill, with one reading and a branch on it.
    const stepTitle = 'Heater hose drop after a refill';
    await page.getByLabel('Kind of step').selectOption('measurement');
    await page.getByRole('button', { name: /Add step/ }).click();
    const form = page.getByRole('form', { name: /^Edit “/ });
    await form.getByLabel('Title', { exact: true }).fill(stepTitle);
    await form
      .getByLabel('What to measure')
      .fill(
        'Engine at operating temperature, heater on full: read the heater inlet and outlet hoses with the IR thermometer and enter how much cooler the outlet is.',
      );
    await form.getByRole('button', { name: /Add reading/ }).click();
    const reading = form.getByRole('group', { name: /^Reading 1/ });
    await reading.getByLabel('Label', { exact: true }).fill('Drop across the heater hoses');
    await reading.getByLabel('Name in formulas').fill('drop');
    await reading.getByLabel('Quantity').selectOption('temperatureDelta');
    await reading.getByLabel('Lowest allowed').fill('0');
    await reading.getByLabel('Highest allowed').fill('80');
    await form.getByLabel('Hot surfaces').check();
    await form.getByRole('button', { name: /Add caution/ }).click();
    await form
      .getByLabel('Caution text')
      .fill(
        'The hoses are hot enough to burn at operating temperature: read them from a distance with the thermometer and follow the maker’s procedure.',
      );

    // A branch with a formula: checked as it is typed and worked out on a sample value.
    await form.getByRole('button', { name: /Add branch/ }).click();
    const branch = form.getByRole('group', { name: /^Branch 1/ });
    await branch.getByLabel('Condition').fill('drop > 15');
    await branch.getByText('Formula reads well').waitFor();
    await branch.getByLabel('Sample drop').fill('20');
    await branch.getByText('holds (true)').waitFor();
    await branch.getByLabel('Label (optional)').fill('Large drop: air in the heater loop');

    // The branch leads nowhere yet and nothing leads to the step: listed and marked on the graph.
    const problems = page.getByRole('list', { name: 'Problems' });
    await problems.getByText('leads nowhere yet').first().waitFor();
    await problems
      .getByText(/cannot be reached from the start/)
      .first()
      .waitFor();
    await branch.getByText('Choose the step this leads to.').waitFor();
    const newNode = graph.getByRole('button', { name: stepTitle });
    await newNode.waitFor();
    await newNode.getByText(/^✕?\s*\d+ problems?$/).waitFor();
    await shot(page, 'tree-editor-dangling-branch');

    // Fixed by connecting: the branch leads to the main-loop bleed, "Otherwise" to the bleed the
    // refill answer led to before (so that step stays reachable)...
    await branch.getByLabel('Leads to', { exact: true }).selectOption({
      label: 'Refill and bleed the main loop',
    });
    await form.getByLabel('When no branch holds, go on to a step').check();
    await form.getByLabel('Otherwise leads to').selectOption({ label: 'Bleed the system first' });
    await problems.getByText('leads nowhere yet').waitFor({ state: 'detached' });

    // ...and the refill answer of the first question now leads to the new step.
    // A graph of more than 60 steps draws only what is in view, and the view is on the new step:
    // fit the whole tree, then drag the empty top-left corner of the pane down until the first
    // question at the top is drawn, and select it as a click would.
    const firstQuestion = graph.getByRole('button', { name: 'When does it run hot?' }).first();
    await graph.scrollIntoViewIfNeeded();
    await graph.getByRole('button', { name: 'Fit View' }).click();
    const pane = (await graph.boundingBox())!;
    const drawn = () =>
      firstQuestion.waitFor({ state: 'attached', timeout: 1_000 }).then(
        () => true,
        () => false,
      );
    for (let i = 0; i < 6 && !(await drawn()); i += 1) {
      await page.mouse.move(pane.x + 8, pane.y + 8);
      await page.mouse.down();
      await page.mouse.move(pane.x + 8, pane.y + pane.height - 8, { steps: 8 });
      await page.mouse.up();
    }
    await firstQuestion.dispatchEvent('click');
    await page
      .getByRole('form', { name: 'Edit “When does it run hot?”' })
      .getByRole('group', { name: /^Answer 3/ })
      .getByLabel('Leads to')
      .selectOption({ label: stepTitle });
    await page.getByText('The draft is complete').waitFor();
    expect(await newNode.textContent()).not.toMatch(/\d+ problems?/);
    await page
      .getByText(/^✓?\s*Saved$/)
      .first()
      .waitFor({ timeout: 20_000 });
    await shot(page, 'tree-editor-connected');

    // Try it: the refill answer reaches the new step, and a large drop goes on to the bleed.
    // The preview creates no case.
    await page.getByRole('button', { name: /Try it/ }).click();
    const tryIt = page.getByRole('region', { name: 'Try it' });
    await tryIt.getByText('When does it run hot?').first().waitFor();
    await tryIt.getByRole('button', { name: /Only since the system was drained/ }).click();
    await tryIt.getByRole('heading', { name: stepTitle }).waitFor();
    await tryIt.getByRole('textbox', { name: 'Drop across the heater hoses' }).fill('20');
    await tryIt.getByText(/Next: .*Refill and bleed the main loop/).waitFor();
    await tryIt.getByRole('button', { name: 'Save reading' }).click();
    await tryIt.getByRole('heading', { name: 'Refill and bleed the main loop' }).waitFor();
    await shot(page, 'tree-editor-try-it');

    await page.getByRole('button', { name: 'Check and publish' }).click();
    await page.getByLabel('Change note').fill('Heater hose check after a refill, before bleeding.');
    await page.getByRole('button', { name: 'Publish', exact: true }).click();
    await page.waitForURL(/\/trees\/[0-9a-f-]{36}$/, { timeout: 30_000 });
    await page
      .getByText(/v2|version 2/i)
      .first()
      .waitFor();
    await shot(page, 'tree-published-v2');

    const kase = (await (await page.request.get(`/api/cases/${caseId}`)).json()) as {
      tree: { version: number };
    };
    expect(kase.tree.version).toBe(1);
    const library = (await (await page.request.get(`/api/trees/${tree.id}`)).json()) as {
      latestPublished: { id: string; version: number };
    };
    expect(library.latestPublished.version).toBe(2);
    // Version 2 holds the new step, reached from the refill answer, with its formula branch.
    const v2 = (await (
      await page.request.get(`/api/trees/${tree.id}/versions/${library.latestPublished.id}`)
    ).json()) as {
      definition: {
        nodes: Record<
          string,
          { title: string; choices?: { to: string }[]; branches?: { when: string; to: string }[] }
        >;
      };
    };
    const [newId, added] =
      Object.entries(v2.definition.nodes).find(([, node]) => node.title === stepTitle) ?? [];
    expect(added?.branches).toEqual([
      expect.objectContaining({ when: 'drop > 15', to: 'main-loop-bleed' }),
    ]);
    expect(v2.definition.nodes['interview-pattern']?.choices?.[2]?.to).toBe(newId);
    await context.close();
  });
});
