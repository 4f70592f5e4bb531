// The page an invitation or reset link opens: POST /api/auth/set-password/check says whose link
// it is (without using it up); POST /api/auth/set-password spends it, sets the password and
// signs the person in.
import {
  accountTokenInfoSchema,
  signInResponseSchema,
  type SetPasswordRequest,
} from '@heatpath/contracts';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { meQueryKey } from '../../../lib/auth';
import { accountLinkKeys } from '../../../lib/query-keys';

export function checkAccountLink(token: string, signal?: AbortSignal) {
  return apiRequest('/api/auth/set-password/check', accountTokenInfoSchema, {
    method: 'POST',
    body: { token },
    signal,
  });
}

export function accountLinkQueryOptions(token: string) {
  return queryOptions({
    queryKey: accountLinkKeys.token(token),
    queryFn: ({ signal }) => checkAccountLink(token, signal),
    staleTime: Infinity,
    retry: false,
  });
}

export function useAccountLink(token: string) {
  return useQuery({ ...accountLinkQueryOptions(token), enabled: token !== '' });
}

export function setPassword(body: SetPasswordRequest) {
  return apiRequest('/api/auth/set-password', signInResponseSchema, { method: 'POST', body });
}

export function useSetPassword() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: setPassword,
    onSuccess: ({ me }) => {
      queryClient.clear();
      queryClient.setQueryData(meQueryKey, me);
    },
  });
}
