import type { Role } from '@heatpath/contracts';
import { cleanup, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { errorResponse, json, makeMe, makeStaffMember, mockApi } from '../test/api-mock';
import { renderApp } from '../test/render-app';

const casebookEntry = {
  id: '00000000-0000-4000-8000-0000000000d1',
  symptom: 'Overheats now and then, no fault codes stored',
  complaint: 'Gauge climbs on long climbs.',
  treeTitle: 'Overheats now and then',
  difficulty: 'starter',
  vehicle: {
    make: 'Corvane',
    model: 'Tessel',
    year: 2017,
    engine: null,
    fuel: null,
    mileageAtIntake: null,
    mileageUnit: 'km',
  },
  stepCount: 9,
  attempts: 0,
  bestScore: null,
};

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const navByRole: Record<Role, string[]> = {
  lead: ['Home', 'Staff', 'Decision trees', 'Cases', 'Training', 'Outbox', 'Calculators'],
  technician: ['Home', 'My cases', 'Calculators'],
  apprentice: ['Home', 'Casebook', 'Calculators'],
  advisor: ['Home', 'Findings', 'Calculators'],
};

async function mainNavLinks(): Promise<string[]> {
  const nav = await screen.findByRole('navigation', { name: 'Main' });
  // The "later" marker is part of the link text; the area's own name comes first.
  return within(nav)
    .getAllByRole('link')
    .map((link) => link.textContent?.replace(/later$/, '').trim() ?? '');
}

describe('the signed-in shell', () => {
  it.each(Object.entries(navByRole) as [Role, string[]][])(
    'shows a %s only their own areas',
    async (role, expected) => {
      mockApi({ 'GET /api/me': () => json(makeMe({ role })) });
      renderApp('/');
      expect(await mainNavLinks()).toEqual(expected);
      expect(await screen.findByRole('heading', { level: 1, name: /Hello/ })).toBeTruthy();
    },
  );

  it('opens the casebook for an apprentice: courses and cases, never the answer', async () => {
    mockApi({
      'GET /api/me': () => json(makeMe({ role: 'apprentice' })),
      'GET /api/training/casebook': () =>
        json({
          courses: [
            {
              id: '00000000-0000-4000-8000-0000000000b1',
              title: 'First month',
              description: null,
              forEveryone: true,
              trainingCaseIds: [casebookEntry.id],
              signOff: null,
            },
          ],
          cases: [casebookEntry],
        }),
    });
    renderApp('/casebook');
    expect(await screen.findByRole('heading', { level: 1, name: 'Casebook' })).toBeTruthy();
    expect(await screen.findByRole('heading', { name: 'First month' })).toBeTruthy();
    expect(screen.getAllByText(/Overheats now and then, no fault codes stored/)).toHaveLength(2);
    expect(screen.queryByText(/Coming with/)).toBeNull();
    expect(screen.getByRole('link', { name: 'My progress' })).toBeTruthy();
  });

  it('sends a visitor without a session to sign-in, remembering the screen', async () => {
    mockApi({ 'GET /api/me': () => errorResponse(401, 'unauthenticated', 'Sign in first.') });
    const { router } = renderApp('/staff');
    expect(await screen.findByRole('heading', { level: 1, name: 'Sign in' })).toBeTruthy();
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(router.state.location.search).toBe('?next=%2Fstaff');
  });

  it('turns a role away from another role’s area with an explanation', async () => {
    mockApi({ 'GET /api/me': () => json(makeMe({ role: 'apprentice' })) });
    renderApp('/staff');
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Not open to your role' }),
    ).toBeTruthy();
    expect(screen.getByRole('alert').textContent).toContain('Staff is open to: Workshop lead');
    // The frame stays, so the person can go on from here.
    expect(screen.getByRole('navigation', { name: 'Main' })).toBeTruthy();
  });

  it('shows a not-found page for an unknown address', async () => {
    mockApi({ 'GET /api/me': () => json(makeMe()) });
    renderApp('/no-such-screen');
    expect(await screen.findByRole('heading', { level: 1, name: 'Page not found' })).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Go to home' })).toBeTruthy();
  });

  it('shows the API’s message when the frame cannot load', async () => {
    mockApi({
      'GET /api/me': () => errorResponse(503, 'unavailable', 'The database is not answering.'),
    });
    renderApp('/');
    // Server errors are retried twice before the page gives up, hence the longer wait.
    expect((await screen.findByRole('alert', {}, { timeout: 6000 })).textContent).toContain(
      'The database is not answering.',
    );
    expect(screen.getByRole('button', { name: 'Reload Heatpath' })).toBeTruthy();
  });

  it('signs out and returns to sign-in', async () => {
    let signedIn = true;
    mockApi({
      'GET /api/me': () =>
        signedIn ? json(makeMe()) : errorResponse(401, 'unauthenticated', 'Sign in first.'),
      'POST /api/auth/sign-out': () => {
        signedIn = false;
        return new Response(null, { status: 204 });
      },
    });
    const { router } = renderApp('/');
    await userEvent.setup().click(await screen.findByRole('button', { name: 'Sign out' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/sign-in'));
    expect(await screen.findByRole('button', { name: 'Sign in' })).toBeTruthy();
  });
});

describe('the staff screen', () => {
  const lead = makeMe();
  const tech = makeStaffMember();

  it('lists the workshop’s people, marking the lead’s own row', async () => {
    mockApi({
      'GET /api/me': () => json(lead),
      'GET /api/staff': () =>
        json({
          staff: [
            makeStaffMember({ id: lead.id, email: lead.email, name: lead.name, role: 'lead' }),
            tech,
          ],
        }),
    });
    renderApp('/staff');
    const table = await screen.findByRole('table', { name: 'Staff of Harbour Lane Garage' });
    expect(within(table).getByRole('rowheader', { name: /Tomas Brand/ })).toBeTruthy();
    expect(within(table).getByText('(you)')).toBeTruthy();
    expect(screen.getByRole('combobox', { name: 'Role for Tomas Brand' })).toBeTruthy();
    // No control lets the lead lock themself out.
    expect(screen.queryByRole('button', { name: `Deactivate ${lead.name}` })).toBeNull();
  });

  it('shows an error with a retry when the list cannot load', async () => {
    mockApi({
      'GET /api/me': () => json(lead),
      'GET /api/staff': () => errorResponse(500, 'internal', 'The staff list is not available.'),
    });
    renderApp('/staff');
    expect((await screen.findByRole('alert', {}, { timeout: 6000 })).textContent).toContain(
      'The staff list is not available.',
    );
    expect(screen.getByRole('button', { name: 'Try again' })).toBeTruthy();
  });

  it('deactivates a person only after confirming', async () => {
    let staff = [tech];
    const { requests } = mockApi({
      'GET /api/me': () => json(lead),
      'GET /api/staff': () => json({ staff }),
      'PATCH /api/staff/*': () => {
        staff = [{ ...tech, active: false }];
        return json(staff[0]);
      },
    });
    renderApp('/staff');
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: 'Deactivate Tomas Brand' }));
    expect(requests.some((r) => r.method === 'PATCH')).toBe(false);
    await user.click(screen.getByRole('button', { name: 'Yes, deactivate Tomas Brand' }));
    expect(await screen.findByRole('button', { name: 'Reactivate Tomas Brand' })).toBeTruthy();
    const patch = requests.find((r) => r.method === 'PATCH');
    expect(patch?.path).toBe(`/api/staff/${tech.id}`);
    expect(patch?.body).toEqual({ active: false });
    expect(screen.getByText('Deactivated')).toBeTruthy();
  });

  it('puts an e-mail conflict beside the e-mail field', async () => {
    mockApi({
      'GET /api/me': () => json(lead),
      'GET /api/staff': () => json({ staff: [tech] }),
      'POST /api/staff': () =>
        errorResponse(409, 'conflict', 'Someone in Heatpath already uses that e-mail address.'),
    });
    renderApp('/staff');
    const user = userEvent.setup();
    const form = await screen.findByRole('form', { name: 'Add a staff member' });
    await user.type(within(form).getByLabelText('Name'), 'Ines Roth');
    await user.type(within(form).getByLabelText('E-mail address'), 'tech@harbourlane.test');
    await user.selectOptions(within(form).getByLabelText('Role'), 'apprentice');
    await user.type(within(form).getByLabelText(/First password/), 'a-long-first-password');
    await user.click(within(form).getByRole('button', { name: 'Add staff member' }));

    expect((await within(form).findByRole('alert')).textContent).toContain('already uses');
    const email = within(form).getByLabelText('E-mail address');
    expect(email.getAttribute('aria-invalid')).toBe('true');
  });
});
