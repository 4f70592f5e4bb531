import { QueryClientProvider } from '@tanstack/react-query';
import { cleanup, render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { createMemoryRouter, RouterProvider } from 'react-router';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { createQueryClient } from '../../../lib/query-client';
import { errorResponse, json, mockApi } from '../../../test/api-mock';
import { UnlockSignIn } from './unlock-sign-in';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const token = 'u'.repeat(43);

function renderPage(withToken = token) {
  const queryClient = createQueryClient({ onUnauthenticated: vi.fn() });
  const router = createMemoryRouter([{ path: '/', element: <UnlockSignIn token={withToken} /> }]);
  render(
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>,
  );
}

describe('UnlockSignIn', () => {
  it('waits for a tap, then lifts the pause and offers sign-in', async () => {
    const { requests } = mockApi({
      'POST /api/auth/unlock': () =>
        json({ message: 'The pause is lifted: you can sign in from any browser again.' }),
    });
    renderPage();
    expect(requests).toHaveLength(0);
    await userEvent.setup().click(screen.getByRole('button', { name: 'Lift the pause' }));
    const status = await screen.findByRole('status');
    expect(status.textContent).toContain('The pause is lifted');
    expect(screen.getByRole('link', { name: 'Sign in' })).toBeTruthy();
    expect(requests[0]?.body).toEqual({ token });
  });

  it('says when the link no longer works', async () => {
    mockApi({
      'POST /api/auth/unlock': () =>
        errorResponse(
          404,
          'not_found',
          'This link no longer works: it was used already or has expired. Ask for a new one.',
        ),
    });
    renderPage();
    await userEvent.setup().click(screen.getByRole('button', { name: 'Lift the pause' }));
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('This link no longer works');
  });

  it('explains an incomplete link without sending anything', () => {
    const { fetchMock } = mockApi({});
    renderPage('');
    expect(screen.getByRole('alert').textContent).toContain('This link is incomplete');
    expect(fetchMock).not.toHaveBeenCalled();
  });
});
