// The repair-order screen against a stand-in API: an edit makes approving and sending wait
// until it is saved, the save names the revision it edited with the chosen photos, and a
// newer unapproved revision says the downloads still carry the approved one.
import type { RepairOrderReview } from '@heatpath/contracts';
import { cleanup, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { json, makeMe, mockApi } from '../../../test/api-mock';
import { renderApp } from '../../../test/render-app';

const caseId = '00000000-0000-4000-8000-0000000000c1';
const photoId = '00000000-0000-4000-8000-0000000000f1';
const advisor = makeMe({
  role: 'advisor',
  name: 'Priya Tallis',
  email: 'advisor@harbourlane.test',
});

const revision = (n: number, approved: boolean) => ({
  revision: n,
  outcomeNodeId: 'pump-shroud-stuck',
  concern: 'Gauge climbs on long climbs.',
  cause: 'The pump shroud stays out over the impeller.',
  correction: 'Replace the coolant pump.',
  parts: [{ description: 'Switchable coolant pump', quantity: 1, partNumber: null }],
  labour: [{ operation: 'Remove and refit coolant pump', hours: 3 }],
  followUps: ['Drive to full temperature, let it cool, then recheck the level.'],
  readings: [
    { nodeId: 'x', label: 'Coolant temperature', value: 110, unit: 'degC', display: '110 °C' },
  ],
  photoIds: [],
  savedAt: '2025-03-04T09:40:00.000Z',
  savedBy: { id: advisor.id, name: 'Dev Okonkwo-Hale' },
  changes: ['Drafted from the finding the walk reached'],
  approvedAt: approved ? '2025-03-04T10:00:00.000Z' : null,
  approvedBy: approved ? { id: advisor.id, name: 'Priya Tallis' } : null,
});

function review(overrides: Partial<RepairOrderReview> = {}): RepairOrderReview {
  const current = revision(1, false);
  return {
    caseId,
    reference: 'C-00012',
    status: 'diagnosed',
    complaint: 'Gauge climbs on long climbs.',
    diagnosedAt: '2025-03-04T09:45:00.000Z',
    workshopName: 'Harbour Lane Garage',
    vehicle: { plate: 'HL17 KVR', vin: null, make: 'Corvane', model: 'Tessel', year: 2017 },
    customer: { name: 'Morwenna Tregarth', email: 'morwenna@example.test', phone: null },
    technician: { id: advisor.id, name: 'Dev Okonkwo-Hale' },
    tree: { title: 'Overheats now and then', version: 1 },
    outcomeTitle: 'Switchable pump shroud stuck',
    current,
    revisions: [current],
    approvedRevision: null,
    photos: [
      {
        id: photoId,
        name: 'shroud.png',
        url: '/f',
        thumbnailUrl: null,
        width: 320,
        height: 240,
        stepTitle: 'Shroud inspection',
      },
    ],
    sends: [],
    can: { edit: true, approve: true, send: false },
    ...overrides,
  };
}

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('repair-order screen', () => {
  it('waits for an edit to be saved before approving, and saves it as the next revision', async () => {
    const { requests } = mockApi({
      'GET /api/me': () => json(advisor),
      [`GET /api/cases/${caseId}/findings/review`]: () => json(review()),
      [`PUT /api/cases/${caseId}/findings`]: () => json({ id: caseId }),
    });
    const user = userEvent.setup();
    renderApp(`/cases/${caseId}/repair-order`);
    const approve = await screen.findByRole('button', { name: /Approve revision 1/ });
    expect(approve).toHaveProperty('disabled', false);

    const quantity = screen.getByLabelText('Quantity of part 1');
    await user.clear(quantity);
    await user.type(quantity, '2');
    await user.click(screen.getByLabelText(/shroud\.png/));
    expect(approve).toHaveProperty('disabled', true);
    expect(screen.getByText(/Save your changes first/)).toBeTruthy();

    await user.click(screen.getByRole('button', { name: 'Save revision 2' }));
    await waitFor(() => expect(requests.some((r) => r.method === 'PUT')).toBe(true));
    const put = requests.find((r) => r.method === 'PUT');
    expect(put?.body).toMatchObject({
      revision: 1,
      parts: [{ description: 'Switchable coolant pump', quantity: 2, partNumber: null }],
      photoIds: [photoId],
    });
  });

  it('says that downloads carry the approved revision while a newer one is not approved', async () => {
    const approved = revision(1, true);
    const newer = { ...revision(2, false), changes: ['Correction edited'] };
    mockApi({
      'GET /api/me': () => json(advisor),
      [`GET /api/cases/${caseId}/findings/review`]: () =>
        json(
          review({
            current: newer,
            revisions: [newer, approved],
            approvedRevision: 1,
            can: { edit: true, approve: true, send: true },
          }),
        ),
    });
    renderApp(`/cases/${caseId}/repair-order`);
    expect(await screen.findByText('Revision 2 is not approved')).toBeTruthy();
    const pdf = screen
      .getAllByRole('link')
      .find((link) => link.textContent?.includes('Download PDF of revision 1'));
    expect(pdf?.getAttribute('href')).toBe(`/api/cases/${caseId}/findings/export/pdf?revision=1`);
    expect(screen.getByRole('form', { name: 'Send the repair order' })).toBeTruthy();
    expect(screen.getByText('Correction edited')).toBeTruthy();
  });
});
