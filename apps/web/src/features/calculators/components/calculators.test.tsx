import type { Me } from '@heatpath/contracts';
import { cleanup, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { errorResponse, json, makeMe, mockApi, type RecordedRequest } from '../../../test/api-mock';
import { renderApp } from '../../../test/render-app';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

function withUnits(me: Me, units: Partial<Me['preferences']['units']>): Me {
  return { ...me, preferences: { units: { ...me.preferences.units, ...units } } };
}

function signedInAs(me: Me = makeMe({ role: 'technician' })) {
  let current = me;
  return mockApi({
    'GET /api/me': () => json(current),
    'PATCH /api/me/preferences': (request: RecordedRequest) => {
      const body = request.body as { units: Partial<Me['preferences']['units']> };
      current = withUnits(current, body.units);
      return json(current);
    },
  });
}

/** The error message a box points at through aria-describedby. */
function errorBeside(input: HTMLElement): string {
  const errorId = input
    .getAttribute('aria-describedby')
    ?.split(' ')
    .find((id) => id.endsWith('-error'));
  return document.getElementById(errorId ?? '')?.textContent ?? '';
}

async function resultPanel() {
  return within(await screen.findByRole('region', { name: 'Result' }));
}

describe('calculators', () => {
  it('lists every calculator on its own lazily loaded screen', async () => {
    signedInAs();
    renderApp('/calculators');
    // The first test loads the lazy chunk (mathjs) for the whole file; on a busy machine that
    // alone can take more than the default second — or the default five-second test limit, so
    // this test gets its own, longer one.
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Calculators' }, { timeout: 12_000 }),
    ).toBeTruthy();
    for (const name of [
      'Coolant protection',
      'Mix adjustment',
      'Boiling margin',
      'Temperature drop',
      'Pressure test',
      'Heat flow',
    ]) {
      expect(screen.getByRole('link', { name: new RegExp(name) })).toBeTruthy();
    }
  }, 15_000);

  it('works out protection from a freeze-point reading, with its source and cautions', async () => {
    signedInAs();
    renderApp('/calculators/protection');
    const user = userEvent.setup();
    await user.click(await screen.findByRole('radio', { name: /Ethylene glycol/ }));
    await user.type(screen.getByLabelText('Freeze point reading'), '-37');

    const result = await resultPanel();
    // Freezing points are shown to whole degrees (refractometers read to ±1 K, ASTM D3321).
    expect(result.getByText('−37 °C')).toBeTruthy();
    expect(result.getByText(/ASHRAE Handbook/)).toBeTruthy();
    expect(result.getByText(/Never open the cap or a bleed screw on a hot system/)).toBeTruthy();
    expect(result.getByText(/Glycol is poisonous/)).toBeTruthy();
  });

  it('gives no figure when the glycol is not known', async () => {
    signedInAs();
    renderApp('/calculators/protection');
    const user = userEvent.setup();
    await user.click(await screen.findByRole('radio', { name: /Not known or mixed/ }));
    await user.type(screen.getByLabelText('Freeze point reading'), '-37');
    const result = await resultPanel();
    expect(result.getByText('No figure without the glycol')).toBeTruthy();
    expect(result.queryByText(/°C$/)).toBeNull();
  });

  it('warns instead of giving a figure for an over-concentrated mix', async () => {
    signedInAs();
    renderApp('/calculators/protection');
    const user = userEvent.setup();
    await user.click(await screen.findByRole('radio', { name: /Ethylene glycol/ }));
    await user.click(screen.getByRole('radio', { name: 'Concentration' }));
    await user.type(screen.getByLabelText('Concentration'), '70');
    const result = await resultPanel();
    expect(result.getByText('No figure')).toBeTruthy();
    expect(result.getByText(/protection falls again/)).toBeTruthy();
  });

  it('shows the coolant package’s error beside the box at fault', async () => {
    signedInAs();
    renderApp('/calculators/temperature-drop');
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText('Radiator inlet'), '95');
    const outlet = screen.getByLabelText('Radiator outlet');
    await user.type(outlet, 'abc');

    expect(outlet.getAttribute('aria-invalid')).toBe('true');
    const errorId = outlet
      .getAttribute('aria-describedby')
      ?.split(' ')
      .find((id) => id.endsWith('-error'));
    expect(document.getElementById(errorId ?? '')?.textContent).toContain(
      'Could not read "abc" as a temperature',
    );
    expect(screen.getByLabelText('Radiator inlet').getAttribute('aria-invalid')).toBeNull();
  });

  it('judges a temperature drop and names the rule’s standing', async () => {
    signedInAs();
    renderApp('/calculators/temperature-drop');
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText('Radiator inlet'), '95');
    await user.type(screen.getByLabelText('Radiator outlet'), '75');
    const result = await resultPanel();
    expect(result.getByText('Low flow suspected')).toBeTruthy();
    expect(result.getByText('20.0 K')).toBeTruthy();
    expect(result.getByText(/trade article; low–medium/)).toBeTruthy();
  });

  it('remembers a unit change for the person and shows figures in it', async () => {
    const { requests } = signedInAs();
    renderApp('/calculators/boiling');
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText('Cap rating'), '1');
    let result = await resultPanel();
    // IAPWS-IF97: 120.42 °C at 1.0 bar gauge (trade-facts.md), shown to whole degrees.
    expect(result.getByText('120 °C')).toBeTruthy();
    expect(result.getByText(/A glycol–water mix boils higher/)).toBeTruthy();
    expect(result.getByText(/IAPWS-IF97/)).toBeTruthy();

    await user.click(screen.getByRole('radio', { name: '°F' }));
    result = await resultPanel();
    // 120.42 °C = 248.8 °F, shown to whole degrees.
    await waitFor(() => expect(result.getByText('249 °F')).toBeTruthy());
    const patch = requests.find((r) => r.method === 'PATCH');
    expect(patch?.path).toBe('/api/me/preferences');
    expect(patch?.body).toEqual({ units: { temperature: 'F' } });
    expect(patch?.headers['x-heatpath-client']).toBe('web');
  });

  it('puts the unit back and says so when the choice cannot be saved', async () => {
    mockApi({
      'GET /api/me': () => json(makeMe({ role: 'apprentice' })),
      'PATCH /api/me/preferences': () =>
        errorResponse(503, 'unavailable', 'Preferences cannot be saved right now.'),
    });
    renderApp('/calculators/boiling');
    const user = userEvent.setup();
    await user.click(await screen.findByRole('radio', { name: 'psi' }));
    expect((await screen.findByRole('alert')).textContent).toContain(
      'Preferences cannot be saved right now.',
    );
    expect((screen.getByRole('radio', { name: 'bar' }) as HTMLInputElement).checked).toBe(true);
  });

  it('reads a pressure test into a verdict', async () => {
    signedInAs();
    renderApp('/calculators/pressure-test');
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText('Cap rating'), '1.2');
    await user.type(screen.getByLabelText('Pressure at the start'), '1.2');
    await user.type(screen.getByLabelText('Pressure at the end'), '1.2');
    await user.type(screen.getByLabelText('Minutes held'), '15');
    const result = await resultPanel();
    expect(result.getByText('Holds pressure')).toBeTruthy();
    expect(result.getByText(/common practice, no numeric allowable drop published/)).toBeTruthy();
  });

  it('calls a 0.69 bar loss in 10 minutes a clear leak', async () => {
    signedInAs();
    renderApp('/calculators/pressure-test');
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText('Cap rating'), '1.4');
    await user.type(screen.getByLabelText('Pressure at the start'), '1.4');
    await user.type(screen.getByLabelText('Pressure at the end'), '0.71');
    await user.type(screen.getByLabelText('Minutes held'), '10');
    const result = await resultPanel();
    expect(result.getByText('Clear leak')).toBeTruthy();
    expect(result.getByText('0.69 bar')).toBeTruthy();
    // A normal 1.4 bar cap is not flagged as unusual (1.4–1.6 bar are common; common practice).
    expect(result.queryByText(/is outside the usual/)).toBeNull();
  });

  it('reads a pressure rise on a cold, stopped engine as still warming, not combustion gas', async () => {
    signedInAs();
    renderApp('/calculators/pressure-test');
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText('Cap rating'), '1.0');
    await user.type(screen.getByLabelText('Pressure at the start'), '1.0');
    await user.type(screen.getByLabelText('Pressure at the end'), '1.2');
    await user.type(screen.getByLabelText('Minutes held'), '15');
    const result = await resultPanel();
    expect(result.getByText('Pressure rose: still warming')).toBeTruthy();
    expect(result.getByText(/A stopped engine makes no combustion gas/)).toBeTruthy();
  });

  it('refuses a test pumped well above the cap rating, beside the start pressure', async () => {
    signedInAs();
    renderApp('/calculators/pressure-test');
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText('Cap rating'), '1.0');
    const start = screen.getByLabelText('Pressure at the start');
    await user.type(start, '2.5');
    await user.type(screen.getByLabelText('Pressure at the end'), '2.5');
    await user.type(screen.getByLabelText('Minutes held'), '15');
    await waitFor(() => expect(start.getAttribute('aria-invalid')).toBe('true'));
    expect(errorBeside(start)).toMatch(/more than 10 % above the 1.00 bar cap rating/);
    expect(screen.queryByText('Holds pressure')).toBeNull();
  });

  it('refuses a 30 bar cap on the boiling margin instead of working it out', async () => {
    signedInAs();
    renderApp('/calculators/boiling');
    const user = userEvent.setup();
    const cap = await screen.findByLabelText('Cap rating');
    await user.type(cap, '30');
    await waitFor(() => expect(cap.getAttribute('aria-invalid')).toBe('true'));
    expect(errorBeside(cap)).toMatch(/No road-vehicle pressure cap is rated 30 bar/);
  });

  it('refuses a running temperature no liquid coolant can have', async () => {
    signedInAs();
    renderApp('/calculators/boiling');
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText('Cap rating'), '1.4');
    const running = screen.getByLabelText('Running coolant temperature');
    await user.type(running, '500');
    await waitFor(() => expect(running.getAttribute('aria-invalid')).toBe('true'));
    expect(errorBeside(running)).toMatch(/not a liquid coolant temperature/);
  });

  it('refuses a 5,000 L system in the mix adjustment', async () => {
    signedInAs();
    renderApp('/calculators/mix');
    const user = userEvent.setup();
    await user.click(await screen.findByRole('radio', { name: /Ethylene glycol/ }));
    const system = screen.getByLabelText('System capacity');
    await user.type(system, '5000');
    await user.type(screen.getByLabelText('Present strength'), '30');
    await waitFor(() => expect(system.getAttribute('aria-invalid')).toBe('true'));
    expect(errorBeside(system)).toMatch(/more coolant than any road vehicle holds/);
  });

  it('works out heat flow for propylene glycol near 100 °C, rounded to 2 figures, with the ASHRAE source', async () => {
    signedInAs();
    renderApp('/calculators/heat-flow');
    const user = userEvent.setup();
    await user.click(await screen.findByRole('radio', { name: /Propylene glycol/ }));
    await user.type(screen.getByLabelText('Coolant flow'), '40');
    await user.type(screen.getByLabelText('Inlet temperature'), '103');
    await user.type(screen.getByLabelText('Outlet temperature'), '97');
    const result = await resultPanel();
    // ASHRAE 50 vol % PG at 100 °C (CoolProp reproduction): 983 kg/m³, 3841 J/(kg·K);
    // 40 L/min × 983 kg/m³ / 60,000 × 3841 × 6 K = 15.1 kW → "15 kW".
    expect(result.getByText('15 kW')).toBeTruthy();
    expect(result.getByText('983 kg/m³')).toBeTruthy();
    expect(result.getByText('3840 J/(kg·K)')).toBeTruthy();
    expect(
      result.getByText(/ASHRAE Handbook—Fundamentals, density and specific-heat/),
    ).toBeTruthy();
  });

  it('refuses 1,000,000 L/min beside the flow box', async () => {
    signedInAs();
    renderApp('/calculators/heat-flow');
    const user = userEvent.setup();
    await user.click(await screen.findByRole('radio', { name: /Ethylene glycol/ }));
    const flow = screen.getByLabelText('Coolant flow');
    await user.type(flow, '1000000');
    await user.type(screen.getByLabelText('Inlet temperature'), '90');
    await user.type(screen.getByLabelText('Outlet temperature'), '84');
    await waitFor(() => expect(flow.getAttribute('aria-invalid')).toBe('true'));
    expect(errorBeside(flow)).toMatch(/more than any vehicle coolant pump moves/);
  });

  it('shows not-found for an unknown calculator', async () => {
    signedInAs();
    renderApp('/calculators/flux-capacitor');
    expect(await screen.findByRole('heading', { level: 1, name: 'Page not found' })).toBeTruthy();
  });
});
