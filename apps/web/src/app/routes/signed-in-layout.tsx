// The frame for every screen that needs a session; its loader sends anyone without one to sign-in.
import type { QueryClient } from '@tanstack/react-query';
import { Outlet, ScrollRestoration, type LoaderFunctionArgs } from 'react-router';
import { requireMe } from '../guards';
import { AppShell } from '../shell/app-shell';

export function signedInLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    await requireMe(queryClient, request);
    return null;
  };
}

export function SignedInLayout() {
  return (
    <AppShell>
      <Outlet />
      {/* A new screen starts at its top (a case opened from the foot of the intake form shows its
          step, not its history); back and forward return to where the person was. */}
      <ScrollRestoration />
    </AppShell>
  );
}
