// POST /api/auth/sign-out: ends the session; the cache is emptied whatever the answer, because a
// shared tablet must not keep showing the last person's data.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequestNoContent } from '../../../lib/api-client';

export function signOut() {
  return apiRequestNoContent('/api/auth/sign-out', { method: 'POST' });
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    meta: { expectsUnauthenticated: true },
    onSettled: () => queryClient.clear(),
  });
}
