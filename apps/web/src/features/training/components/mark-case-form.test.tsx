// The lead's "Mark a finished case for training" form against a stand-in API: missing choices are
// named in words beside their fields and nothing is sent; a complete form sends the chosen case,
// the note, the difficulty and exactly the photos ticked to hide.
import { cleanup, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { json, makeMe, mockApi } from '../../../test/api-mock';
import { renderApp } from '../../../test/render-app';
import { candidate } from '../test/training-fixtures';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

function api() {
  return mockApi({
    'GET /api/me': () => json(makeMe()),
    'GET /api/training/cases': () => json({ trainingCases: [] }),
    'GET /api/training/candidates': () => json({ cases: [candidate] }),
    'POST /api/training/cases': (request) =>
      json(
        {
          id: '00000000-0000-4000-8000-0000000000d1',
          caseId: candidate.caseId,
          caseReference: candidate.reference,
          symptom: candidate.symptom,
          treeTitle: 'Overheats now and then',
          outcomeTitle: candidate.outcomeTitle,
          difficulty: 'starter',
          teachingNote: (request.body as { teachingNote: string }).teachingNote,
          hideNotes: true,
          hiddenAttachmentIds: (request.body as { hiddenAttachmentIds: string[] })
            .hiddenAttachmentIds,
          withdrawn: false,
          markedBy: { id: makeMe().id, name: 'Rosa Quell' },
          createdAt: '2025-03-10T09:00:00.000Z',
          attempts: 0,
        },
        201,
      ),
  });
}

describe('mark a finished case for training', () => {
  it('says what is missing in words and sends nothing', async () => {
    const { requests } = api();
    const user = userEvent.setup();
    renderApp('/training');
    const form = await screen.findByRole('form', { name: 'Mark a finished case for training' });
    expect(within(form).getByText(/never reach an apprentice/)).toBeTruthy();
    await user.click(within(form).getByRole('button', { name: 'Mark for training' }));

    expect(within(form).getByText('Choose the finished case to teach from.')).toBeTruthy();
    expect(within(form).getByText('Write a short teaching note for the apprentice.')).toBeTruthy();
    expect(within(form).getByText(/Choose how hard the case is/)).toBeTruthy();
    expect(within(form).getByLabelText('Teaching note').getAttribute('aria-invalid')).toBe('true');
    expect(requests.some((r) => r.method === 'POST')).toBe(false);
  });

  it('hides the photos ticked, and the notes when asked, in what it sends', async () => {
    const { requests } = api();
    const user = userEvent.setup();
    renderApp('/training');
    const form = await screen.findByRole('form', { name: 'Mark a finished case for training' });
    await user.click(await within(form).findByRole('radio', { name: /C-00012/ }));
    // The case's note and photos appear once it is chosen, each photo with its thumbnail.
    expect(within(form).getByText('Customer asked for a call first.')).toBeTruthy();
    expect(form.querySelectorAll('img[src="/api/files/f2/thumb"]')).toHaveLength(1);

    await user.type(
      within(form).getByLabelText('Teaching note'),
      'Feel both hoses before you replace a thermostat.',
    );
    await user.click(within(form).getByRole('radio', { name: /Starter/ }));
    await user.click(within(form).getByRole('checkbox', { name: 'Hide the technician’s notes' }));
    await user.click(
      within(form).getByRole('checkbox', { name: 'Hide this photo: engine-bay-with-plate.png' }),
    );
    await user.click(within(form).getByRole('button', { name: 'Mark for training' }));

    await waitFor(() => expect(requests.some((r) => r.method === 'POST')).toBe(true));
    const post = requests.find((r) => r.method === 'POST');
    expect(post?.body).toEqual({
      caseId: candidate.caseId,
      teachingNote: 'Feel both hoses before you replace a thermostat.',
      difficulty: 'starter',
      hideNotes: true,
      hiddenAttachmentIds: ['00000000-0000-4000-8000-0000000000f2'],
    });
    expect(await screen.findByText(/is in the apprentices’ casebook now/)).toBeTruthy();
  });
});
