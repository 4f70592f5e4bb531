import type { Vehicle } from '@heatpath/contracts';
import { cleanup, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { errorResponse, json, makeMe, mockApi } from '../../../test/api-mock';
import { caseId, makeCaseDetail } from '../../../test/case-fixtures';
import { renderApp } from '../../../test/render-app';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const treeId = '00000000-0000-4000-8000-0000000000a9';

function vehicle(overrides: Partial<Vehicle> = {}): Vehicle {
  return {
    id: '00000000-0000-4000-8000-0000000000e1',
    vin: '1M8GDM9AXKP042788',
    vinWarning: null,
    plate: 'HL17 KVR',
    make: 'Corvane',
    model: 'Tessel 1.4T',
    year: 2017,
    engine: '1.4 turbo petrol',
    fuel: 'petrol',
    mileage: 118400,
    mileageUnit: 'km',
    customer: {
      id: '00000000-0000-4000-8000-0000000000f1',
      name: 'Morwenna Tregarth',
      phone: null,
      email: null,
    },
    ...overrides,
  };
}

function intakeApi(extra: Parameters<typeof mockApi>[0] = {}) {
  return mockApi({
    'GET /api/me': () => json(makeMe({ role: 'technician' })),
    'GET /api/trees/available': () =>
      json({
        trees: [
          {
            id: treeId,
            key: 'overheats-intermittent-no-codes',
            title: 'Overheats now and then, no fault codes stored',
            symptom: 'The gauge climbs from time to time.',
            latestPublished: { id: '00000000-0000-4000-8000-0000000000d1', version: 1 },
          },
        ],
      }),
    'GET /api/vehicles': () => json({ vehicles: [vehicle()] }),
    'POST /api/cases': () => json(makeCaseDetail(), 201),
    [`GET /api/cases/${caseId}`]: () => json(makeCaseDetail()),
    ...extra,
  });
}

describe('a new case', () => {
  it('finds the vehicle by plate, keeps its customer, and opens the case on its first step', async () => {
    const { requests } = intakeApi();
    const { router } = renderApp('/cases/new');
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText('Plate or VIN'), 'hl17');
    await user.click(await screen.findByRole('button', { name: /HL17 KVR/ }));
    expect(screen.getByText('On file for this vehicle')).toBeTruthy();
    await user.type(
      screen.getByLabelText('Complaint in the customer’s words'),
      'Gauge climbs in traffic.',
    );
    await user.type(screen.getByLabelText('Mileage at intake'), '118,650');
    await user.click(screen.getByRole('radio', { name: /Overheats now and then/ }));
    await user.click(screen.getByRole('button', { name: 'Create case' }));

    await waitFor(() => expect(router.state.location.pathname).toBe(`/cases/${caseId}`));
    const created = requests.find((r) => r.method === 'POST' && r.path === '/api/cases');
    expect(created?.body).toEqual({
      vehicleId: vehicle().id,
      complaint: 'Gauge climbs in traffic.',
      mileageAtIntake: 118650,
      mileageUnit: 'km',
      treeId,
    });
    expect(created?.headers['x-heatpath-client']).toBe('web');
    expect(
      await screen.findByRole(
        'heading',
        { level: 2, name: 'When does it run hot?' },
        { timeout: 8000 },
      ),
    ).toBeTruthy();
  });

  it('says what is missing before anything is sent', async () => {
    const { requests } = intakeApi();
    renderApp('/cases/new');
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: 'Create case' }));
    expect(await screen.findByText('Choose or add the vehicle.')).toBeTruthy();
    expect(screen.getByText('Write down the complaint in the customer’s words.')).toBeTruthy();
    expect(screen.getByText('Choose the symptom to start from.')).toBeTruthy();
    expect(requests.some((r) => r.method === 'POST')).toBe(false);
  });

  it('checks a new vehicle’s VIN as it is typed, and offers the one on file on a 409', async () => {
    intakeApi({
      'GET /api/vehicles': () => json({ vehicles: [vehicle({ plate: 'HL20 NEW', vin: null })] }),
      'POST /api/vehicles': () =>
        errorResponse(
          409,
          'conflict',
          'A vehicle with this plate is already on file (Corvane Tessel 1.4T); use that one.',
        ),
    });
    renderApp('/cases/new');
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: 'Add vehicle' }));
    const vin = screen.getByLabelText('VIN');
    await user.type(vin, '1M8GDM9A');
    expect(screen.getByText('8 of 17 characters')).toBeTruthy();
    await user.type(vin, 'O');
    expect(screen.getByText(/never contains the letters I, O or Q/)).toBeTruthy();
    await user.clear(vin);
    // The published worked example with its 9th character changed: the check digit does not match.
    await user.type(vin, '1M8GDM9A1KP042788');
    expect(screen.getByText(/North American check digit would be "X"/)).toBeTruthy();
    expect(screen.getByText('Check this VIN')).toBeTruthy();
    await user.clear(vin);
    await user.type(vin, '1M8GDM9AXKP042788');
    expect(screen.getByText(/the check digit matches/)).toBeTruthy();
    await user.clear(vin);

    await user.type(screen.getByLabelText('Registration plate'), 'hl20 new');
    await user.type(screen.getByLabelText('Make'), 'Corvane');
    await user.type(screen.getByLabelText('Model'), 'Tessel 1.4T');
    await user.click(screen.getByRole('button', { name: 'Save vehicle' }));
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('already on file');
    await user.click(await within(alert).findByRole('button', { name: /Use HL20 NEW/ }));
    expect(await screen.findByRole('button', { name: 'Change vehicle' })).toBeTruthy();
  });
});
