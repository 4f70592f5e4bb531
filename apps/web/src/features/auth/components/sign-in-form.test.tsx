import { QueryClientProvider } from '@tanstack/react-query';
import { cleanup, render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { meQueryKey } from '../../../lib/auth';
import { createQueryClient } from '../../../lib/query-client';
import { errorResponse, json, makeMe, mockApi } from '../../../test/api-mock';
import { SignInForm } from './sign-in-form';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

function renderForm() {
  const onUnauthenticated = vi.fn();
  const queryClient = createQueryClient({ onUnauthenticated });
  const onSignedIn = vi.fn();
  render(
    <QueryClientProvider client={queryClient}>
      <SignInForm onSignedIn={onSignedIn} />
    </QueryClientProvider>,
  );
  return { queryClient, onSignedIn, onUnauthenticated };
}

describe('SignInForm', () => {
  it('shows the API’s message in an alert on a wrong password, and stays on the form', async () => {
    mockApi({
      'POST /api/auth/sign-in': () =>
        errorResponse(401, 'unauthenticated', 'That e-mail and password do not match an account.'),
    });
    const { onSignedIn, onUnauthenticated } = renderForm();
    const user = userEvent.setup();
    await user.type(screen.getByLabelText('E-mail address'), 'tech@harbourlane.test');
    await user.type(screen.getByLabelText('Password'), 'wrong-password');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('That e-mail and password do not match an account.');
    expect(onSignedIn).not.toHaveBeenCalled();
    // A wrong password is not an expired session: no redirect loop to sign-in.
    expect(onUnauthenticated).not.toHaveBeenCalled();
    expect((screen.getByLabelText('Password') as HTMLInputElement).value).toBe('');
  });

  it('says sign-in is paused, in the API’s words, after too many wrong passwords', async () => {
    const paused =
      'Too many wrong passwords for this account from browsers it has not signed in on before, so those are paused for 15 minutes.';
    mockApi({ 'POST /api/auth/sign-in': () => errorResponse(429, 'rate_limited', paused) });
    const { onSignedIn } = renderForm();
    const user = userEvent.setup();
    await user.type(screen.getByLabelText('E-mail address'), 'tech@harbourlane.test');
    await user.type(screen.getByLabelText('Password'), 'heatpath-demo');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('Sign-in paused');
    expect(alert.textContent).toContain(paused);
    expect(onSignedIn).not.toHaveBeenCalled();
  });

  it('checks the fields before sending anything', async () => {
    const { fetchMock } = mockApi({});
    renderForm();
    await userEvent.setup().click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText(/Enter a valid e-mail address/)).toBeTruthy();
    expect(screen.getByLabelText('E-mail address').getAttribute('aria-invalid')).toBe('true');
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('signs in, keeps "me" in the cache and hands over', async () => {
    const me = makeMe({ role: 'technician', name: 'Tomas Brand' });
    const { requests } = mockApi({ 'POST /api/auth/sign-in': () => json({ me }) });
    const { queryClient, onSignedIn } = renderForm();
    const user = userEvent.setup();
    await user.type(screen.getByLabelText('E-mail address'), ' Tech@HarbourLane.test ');
    await user.type(screen.getByLabelText('Password'), 'heatpath-demo');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    await waitFor(() => expect(onSignedIn).toHaveBeenCalled());
    expect(requests[0]?.body).toEqual({
      email: 'tech@harbourlane.test',
      password: 'heatpath-demo',
    });
    expect(queryClient.getQueryData(meQueryKey)).toEqual(me);
  });
});
