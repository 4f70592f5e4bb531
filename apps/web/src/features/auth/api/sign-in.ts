// POST /api/auth/sign-in: exchanges e-mail and password for the session cookie and "me".
import { signInResponseSchema, type SignInRequest } from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { meQueryKey } from '../../../lib/auth';

export function signIn(body: SignInRequest) {
  return apiRequest('/api/auth/sign-in', signInResponseSchema, { method: 'POST', body });
}

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    // A wrong password answers 401; that is the form's message, not an expired session.
    meta: { expectsUnauthenticated: true },
    onSuccess: ({ me }) => {
      // Whatever a previous person left in the cache on this shared tablet must not leak through.
      queryClient.clear();
      queryClient.setQueryData(meQueryKey, me);
    },
  });
}
