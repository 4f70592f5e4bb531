// The "Predict, then see" screen against a stand-in API: the step shows its caution before the
// question, a prediction is sent for the current step, the reveal says what really happened and
// why, and a finished attempt shows the score, the finding, the teaching note and "Try again".
import { cleanup, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { json, makeMe, mockApi } from '../../../test/api-mock';
import { renderApp } from '../../../test/render-app';
import {
  attemptAfterFirst,
  attemptAtStart,
  attemptFinished,
  attemptId,
  trainingCaseId,
} from '../test/training-fixtures';

const apprentice = makeMe({
  id: '00000000-0000-4000-8000-000000000003',
  role: 'apprentice',
  name: 'Kit Marrow',
  email: 'apprentice@harbourlane.test',
});

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('predict, then see', () => {
  it('shows the caution first, sends the prediction for the current step and reveals what happened', async () => {
    const answers = [attemptAfterFirst, attemptFinished];
    const { requests } = mockApi({
      'GET /api/me': () => json(apprentice),
      [`GET /api/training/attempts/${attemptId}`]: () => json(attemptAtStart),
      [`POST /api/training/attempts/${attemptId}/predictions`]: () => json(answers.shift()),
    });
    const user = userEvent.setup();
    renderApp(`/casebook/attempts/${attemptId}`);

    const step = await screen.findByRole('article', { name: 'Coolant level, engine cold' });
    // The caution comes before the question in the page.
    const caution = within(step).getByText(/Only open the cap on a cold system/);
    const prompt = within(step).getByTestId('training-step-prompt');
    expect(caution.compareDocumentPosition(prompt) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();
    expect(within(step).getByText('Yes, between the marks')).toBeTruthy();
    // Where it led is not shown before the prediction.
    expect(screen.queryByText(/next question is whether coolant reaches/)).toBeNull();

    const ask = screen.getByRole('group', { name: /What should the technician check next/ });
    await user.click(screen.getByRole('button', { name: 'See what happened' }));
    expect(screen.getByText('Choose one of the options first.')).toBeTruthy();
    expect(requests.some((r) => r.method === 'POST')).toBe(false);

    await user.click(within(ask).getByRole('radio', { name: 'Pressure-test the system' }));
    await user.click(screen.getByRole('button', { name: 'See what happened' }));

    const reveal = await screen.findByRole('region', {
      name: 'What really happened: Coolant level, engine cold',
    });
    expect(within(reveal).getByText('Not what happened')).toBeTruthy();
    expect(within(reveal).getByText('Pressure-test the system')).toBeTruthy();
    expect(within(reveal).getByText('Radiator hose temperatures')).toBeTruthy();
    expect(within(reveal).getByText(/next question is whether coolant reaches/)).toBeTruthy();
    const post = requests.find((r) => r.method === 'POST');
    expect(post?.path).toBe(`/api/training/attempts/${attemptId}/predictions`);
    expect(post?.body).toEqual({ index: 0, optionId: 'pressure-test' });
    expect(post?.headers['x-heatpath-client']).toBe('web');

    // The next step: a measurement with its readings and computed value.
    const next = screen.getByRole('article', { name: 'Radiator hose temperatures at full heat' });
    expect(within(next).getByText('104 °C')).toBeTruthy();
    expect(within(next).getByText('42 K')).toBeTruthy();
    await user.click(
      within(next).getByRole('radio', { name: 'Switchable pump shroud stuck over the impeller' }),
    );
    await user.click(screen.getByRole('button', { name: 'See what happened' }));

    const score = await screen.findByRole('region', { name: 'Your score' });
    expect(within(score).getByTestId('attempt-score').textContent).toBe('3 / 5');
    expect(within(score).getByText(/1 of 2 predictions right/)).toBeTruthy();
    expect(screen.getByRole('heading', { name: 'Pump shroud stuck' })).toBeTruthy();
    expect(screen.getByText('Feel both hoses before you replace a thermostat.')).toBeTruthy();
    expect(screen.getByText('Coolant pump replaced, system refilled and bled.')).toBeTruthy();
    expect(requests.filter((r) => r.method === 'POST')[1]?.body).toEqual({
      index: 1,
      optionId: 'pump-shroud-stuck',
    });
  });

  it('starts a new attempt with "Try again"', async () => {
    const fresh = { ...attemptAtStart, id: '00000000-0000-4000-8000-0000000000e2' };
    const { requests } = mockApi({
      'GET /api/me': () => json(apprentice),
      [`GET /api/training/attempts/${attemptId}`]: () => json(attemptFinished),
      [`GET /api/training/attempts/${fresh.id}`]: () => json(fresh),
      [`POST /api/training/cases/${trainingCaseId}/attempts`]: () => json(fresh, 201),
    });
    const user = userEvent.setup();
    const { router } = renderApp(`/casebook/attempts/${attemptId}`);
    await user.click(await screen.findByRole('button', { name: 'Try again' }));
    await waitFor(() =>
      expect(router.state.location.pathname).toBe(`/casebook/attempts/${fresh.id}`),
    );
    expect(
      requests.some(
        (r) => r.method === 'POST' && r.path === `/api/training/cases/${trainingCaseId}/attempts`,
      ),
    ).toBe(true);
    expect(await screen.findByRole('button', { name: 'See what happened' })).toBeTruthy();
  });
});
