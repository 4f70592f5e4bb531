// Tree authoring in a real browser: the lead starts a draft of a shipped tree, adds a step and
// sees its problems marked on the graph, fixes them, edits a question, tries the draft, and
// publishes version 2 — while a case opened on version 1 stays on version 1.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launch, screenshot, signIn } from './browser';
import type { BrowserSession } from './browser';

let session: BrowserSession;
beforeAll(async () => {
  session = await launch();
});
afterAll(async () => {
  await session?.close();
});

const treeTitle = 'Overheats now and then, no fault codes stored';
const client = { 'X-Heatpath-Client': 'web' };

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

    // A new measurement step leads nowhere and nothing leads to it: both are marked on the graph.
    await page.getByLabel('Kind of step').selectOption('measurement');
    await page.getByRole('button', { name: /Add step/ }).click();
    const problems = page.getByRole('list', { name: 'Problems' });
    await problems.waitFor();
    expect(await problems.getByRole('listitem').count()).toBeGreaterThan(0);
    await graph
      .getByText(/\d+ problems?/)
      .first()
      .waitFor();
    await screenshot(page, 'tree-editor-problems');

    // Fixed by taking the unfinished step out again.
    await page.getByRole('button', { name: 'Delete step' }).click();
    await page.getByRole('button', { name: 'Yes, delete this step' }).click();
    await page.getByText('The draft is complete').waitFor();

    // Reword the leak check.
    // The step may sit outside the graph's visible area; select it as a click would.
    await graph
      .getByRole('button', { name: /Look for leaks/ })
      .first()
      .dispatchEvent('click');
    await page
      .getByLabel('Question to ask')
      .fill('Look under the car and around the engine bay for coolant, cold engine first.');
    await page
      .getByText(/^✓?\s*Saved$/)
      .first()
      .waitFor({ timeout: 20_000 });

    // Try it: the preview starts at the first step and creates no case.
    await page.getByRole('button', { name: /Try it/ }).click();
    await page
      .getByRole('region', { name: 'Try it' })
      .getByText('When does it run hot?')
      .first()
      .waitFor();
    await screenshot(page, 'tree-editor-try-it');

    await page.getByRole('button', { name: 'Check and publish' }).click();
    await page.getByLabel('Change note').fill('Clearer wording for the leak check.');
    await page.getByRole('button', { name: 'Publish', exact: true }).click();
    await page.waitForURL(/\/trees\/[0-9a-f-]{36}$/, { timeout: 30_000 });
    await page
      .getByText(/v2|version 2/i)
      .first()
      .waitFor();
    await screenshot(page, 'tree-published-v2');

    const kase = (await (await page.request.get(`/api/cases/${caseId}`)).json()) as {
      tree: { version: number };
    };
    expect(kase.tree.version).toBe(1);
    const library = (await (await page.request.get(`/api/trees/${tree.id}`)).json()) as {
      latestPublished: { version: number };
    };
    expect(library.latestPublished.version).toBe(2);
    await context.close();
  });
});
