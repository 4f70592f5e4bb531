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

async function resultPanel() {
  return within(await screen.findByRole('region', { name: 'Result' }));
}

describe('calculators', () => {
  it('lists every calculator on its own lazily loaded screen', async () => {
    signedInAs();
    renderApp('/calculators');
    // The first test loads the lazy chunk (mathjs) for the whole file; on a busy machine that
    // alone can take more than the default second.
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Calculators' }, { timeout: 5000 }),
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
  });

  it('works out protection from a freeze-point reading, with its source and cautions', async () => {
    signedInAs();
    renderApp('/calculators/protection');
    const user = userEvent.setup();
    await user.click(await screen.findByRole('radio', { name: /Ethylene glycol/ }));
    await user.type(screen.getByLabelText('Freeze point reading'), '-37');

    const result = await resultPanel();
    expect(result.getByText('−37.0 °C')).toBeTruthy();
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
    expect(result.getByText('120.4 °C')).toBeTruthy();
    expect(result.getByText(/A glycol–water mix boils higher/)).toBeTruthy();
    expect(result.getByText(/IAPWS-IF97/)).toBeTruthy();

    await user.click(screen.getByRole('radio', { name: '°F' }));
    result = await resultPanel();
    await waitFor(() => expect(result.getByText('248.8 °F')).toBeTruthy());
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

  it('shows not-found for an unknown calculator', async () => {
    signedInAs();
    renderApp('/calculators/flux-capacitor');
    expect(await screen.findByRole('heading', { level: 1, name: 'Page not found' })).toBeTruthy();
  });
});
