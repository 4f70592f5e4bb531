import type { CaseSummary } from '@heatpath/contracts';
import { cleanup, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { json, makeMe, makeStaffMember, mockApi } from '../../../test/api-mock';
import { renderApp } from '../../../test/render-app';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

function summary(number: number, overrides: Partial<CaseSummary> = {}): CaseSummary {
  return {
    id: `00000000-0000-4000-8000-${String(number).padStart(12, '0')}`,
    number,
    reference: `C-${String(number).padStart(5, '0')}`,
    status: 'in_diagnosis',
    complaint: `Complaint ${number}`,
    symptom: 'Overheats',
    vehicle: {
      id: '00000000-0000-4000-8000-0000000000e1',
      plate: `HL${number} ABC`,
      vin: null,
      make: 'Corvane',
      model: 'Tessel',
      year: 2017,
    },
    customerName: 'Morwenna Tregarth',
    assignee: { id: '00000000-0000-4000-8000-000000000002', name: 'Tomas Brand' },
    currentStepTitle: 'Pressure cap test',
    createdAt: '2025-03-01T08:00:00.000Z',
    updatedAt: '2025-03-01T08:00:00.000Z',
    ...overrides,
  };
}

describe('the case list', () => {
  it('shows a technician their own cases, and the next page on “Load more”', async () => {
    const { requests } = mockApi({
      'GET /api/me': () => json(makeMe({ role: 'technician' })),
      'GET /api/cases': (request) =>
        json(
          requests.filter((r) => r.path === request.path).length === 1
            ? { cases: [summary(2)], nextCursor: 'page-2' }
            : { cases: [summary(1)], nextCursor: null },
        ),
    });
    renderApp('/cases');
    expect(await screen.findByRole('heading', { level: 1, name: 'My cases' })).toBeTruthy();
    const list = await screen.findByRole('list', { name: 'Cases' });
    const row = within(list).getByRole('link', { name: /HL2 ABC/ });
    expect(row.getAttribute('href')).toBe(`/cases/${summary(2).id}`);
    expect(row.textContent).toContain('Now: Pressure cap test');
    expect(row.textContent).toContain('In diagnosis');
    expect(row.textContent).toContain('Tomas Brand');
    expect(screen.getByRole('link', { name: 'New case' })).toBeTruthy();
    // Lists are only asked for the person's own cases at first; no staff list for a technician.
    expect(requests.some((r) => r.path === '/api/staff')).toBe(false);

    await userEvent.setup().click(screen.getByRole('button', { name: 'Load more' }));
    expect(await within(list).findByRole('link', { name: /HL1 ABC/ })).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Load more' })).toBeNull();
    const urls = vi
      .mocked(fetch)
      .mock.calls.map(([input]) => String(input))
      .filter((u) => u.startsWith('/api/cases'));
    expect(urls[0]).toContain('scope=mine');
    expect(urls[1]).toContain('cursor=page-2');
  });

  it('searches once typing pauses, and lets a lead filter by technician', async () => {
    mockApi({
      'GET /api/me': () => json(makeMe({ role: 'lead' })),
      'GET /api/staff': () =>
        json({
          staff: [
            makeStaffMember({ invitationPending: false }),
            makeStaffMember({
              invitationPending: false,
              id: '00000000-0000-4000-8000-000000000009',
              name: 'Ada Advisor',
              role: 'advisor',
            }),
          ],
        }),
      'GET /api/cases': () => json({ cases: [], nextCursor: null }),
    });
    const { router } = renderApp('/cases');
    const user = userEvent.setup();
    expect(await screen.findByText('No cases yet. Start one with “New case”.')).toBeTruthy();
    const technician = await screen.findByLabelText('Technician');
    // Only people who walk cases are offered.
    expect(within(technician).queryByText('Ada Advisor')).toBeNull();
    await user.selectOptions(technician, 'Tomas Brand');
    // The filter is kept in the address, so a reload shows the same list.
    await waitFor(() => expect(router.state.location.search).toContain('technician='));
    await user.type(screen.getByLabelText('Search cases'), 'HL17');
    await waitFor(
      () => {
        const urls = vi.mocked(fetch).mock.calls.map(([input]) => String(input));
        expect(
          urls.some(
            (u) => u.includes('q=HL17') && u.includes(`technicianId=${makeStaffMember().id}`),
          ),
        ).toBe(true);
      },
      { timeout: 3000 },
    );
    const typed = vi
      .mocked(fetch)
      .mock.calls.map(([input]) => String(input))
      .filter((u) => u.includes('q=HL'));
    // Not one request per key.
    expect(typed.every((u) => u.includes('q=HL17'))).toBe(true);
    expect(await screen.findByText('No case matches.')).toBeTruthy();
  });

  it('lists only diagnosed cases in the advisor’s findings', async () => {
    mockApi({
      'GET /api/me': () => json(makeMe({ role: 'advisor' })),
      'GET /api/cases': () =>
        json({ cases: [summary(3, { status: 'diagnosed' })], nextCursor: null }),
    });
    renderApp('/findings');
    expect(await screen.findByRole('heading', { level: 1, name: 'Findings' })).toBeTruthy();
    expect(await screen.findByRole('link', { name: /HL3 ABC/ })).toBeTruthy();
    const url = String(
      vi.mocked(fetch).mock.calls.find(([input]) => String(input).startsWith('/api/cases'))?.[0],
    );
    expect(url).toContain('status=diagnosed');
    expect(url).toContain('scope=workshop');
    expect(screen.queryByLabelText('Status')).toBeNull();
  });
});
