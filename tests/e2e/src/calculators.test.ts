// The calculators in a real browser: coolant protection from a concentration, the unit toggle
// remembered for the person across reloads, the boiling point at a cap rating, and heat flow for
// propylene glycol near 100 °C.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launch, screenshot, signIn, startWithUnits } from './browser';
import type { BrowserSession } from './browser';

let session: BrowserSession;
beforeAll(async () => {
  session = await launch();
});
afterAll(async () => {
  await session?.close();
});

describe('calculators', () => {
  it('gives the protection of a 50 % EG mix, in °C then °F, and remembers the unit', async () => {
    const { page, context } = await session.newPage({ width: 390, height: 844 });
    await signIn(page, 'apprentice@harbourlane.test');
    await startWithUnits(page);
    await page.goto('/calculators');
    await page.getByRole('link', { name: /Coolant protection/ }).click();
    await page.getByText('Ethylene glycol (EG)').click();
    await page
      .getByRole('group', { name: 'The refractometer shows' })
      .getByText('Concentration')
      .click();
    await page.getByLabel('Concentration', { exact: true }).fill('50');
    const result = page.getByRole('region', { name: 'Result' });
    // ASHRAE table interpolated to 50 vol % EG: about −37.0 °C (trade-facts.md, Source A);
    // shown to whole degrees (refractometers read to ±1 K, ASTM D3321).
    await result.getByText(/^[−-]37\s?°C$/).waitFor();
    await screenshot(page, 'calculator-protection-phone-celsius');
    await page.getByRole('group', { name: 'Temperature unit' }).getByText('°F').click();
    // −37.2 °C is −35.0 °F (°F = °C × 9/5 + 32), shown to whole degrees.
    await result.getByText(/^[−-]3[45]\s?°F$/).waitFor();
    await page.waitForLoadState('networkidle');
    await page.reload();
    await page.getByText('Ethylene glycol (EG)').click();
    await page
      .getByRole('group', { name: 'The refractometer shows' })
      .getByText('Concentration')
      .click();
    await page.getByLabel('Concentration', { exact: true }).fill('50');
    await page.getByRole('region', { name: 'Result' }).getByText(/°F/).first().waitFor();
    await screenshot(page, 'calculator-protection-phone-fahrenheit');
    // Back to °C as the person had it; no other test relies on it (each sets its own units).
    await page.getByRole('group', { name: 'Temperature unit' }).getByText('°C').click();
    await page.waitForLoadState('networkidle');
    await context.close();
  });

  it('shows the water boiling point at a 1.4 bar cap with its source and the hot-system caution', async () => {
    const { page, context } = await session.newPage({ width: 1024, height: 768 });
    await signIn(page, 'tech@harbourlane.test');
    await page.goto('/calculators');
    await page.getByRole('link', { name: /Boiling margin/ }).click();
    await page.getByLabel('Cap rating').fill('1.4');
    const result = page.getByRole('region', { name: 'Result' });
    // IAPWS-IF97 saturation temperature at 2.41325 bar absolute: 126.25 °C (trade-facts.md),
    // shown to whole degrees (a cap opens within about ±0.1 bar of its rating).
    await result
      .getByText(/^126\s?°C$/)
      .first()
      .waitFor();
    expect(await result.getByText(/IAPWS/).count()).toBeGreaterThan(0);
    expect(await page.getByText(/Never open the cap/i).count()).toBeGreaterThan(0);
    await screenshot(page, 'calculator-boiling-tablet');
    await context.close();
  });

  it('works out heat flow for 50 vol % propylene glycol near 100 °C with its ASHRAE source', async () => {
    const { page, context } = await session.newPage({ width: 1024, height: 768 });
    await signIn(page, 'tech@harbourlane.test');
    await page.goto('/calculators');
    await page.getByRole('link', { name: /Heat flow/ }).click();
    await page.getByText('Propylene glycol (PG)').click();
    await page.getByLabel('Coolant flow').fill('40');
    await page.getByLabel('Inlet temperature').fill('103');
    await page.getByLabel('Outlet temperature').fill('97');
    const result = page.getByRole('region', { name: 'Result' });
    // ASHRAE 50 vol % PG at 100 °C (as reproduced in CoolProp): 983 kg/m³, 3841 J/(kg·K);
    // 40 L/min × 983 / 60,000 × 3841 × 6 K = 15.1 kW, shown to 2 figures.
    await result.getByText(/^15 kW$/).waitFor();
    expect(await result.getByText(/ASHRAE Handbook/).count()).toBeGreaterThan(0);
    await screenshot(page, 'calculator-heat-flow-propylene-tablet');
    await context.close();
  });
});
