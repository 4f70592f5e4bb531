// Who is signed in. The signed-in person ("me") lives in the query cache under one key, so the
// shell, the screens and the unit preferences read and update the same record; there is no second
// copy in a React context to drift out of date.
import { meSchema, type Me, type Role } from '@heatpath/contracts';
import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { apiRequest } from './api-client';

export const meQueryKey = ['me'] as const;

export function getMe(signal?: AbortSignal): Promise<Me> {
  return apiRequest('/api/me', meSchema, { signal });
}

export function meQueryOptions() {
  return queryOptions({
    queryKey: meQueryKey,
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 5 * 60_000,
  });
}

/**
 * The signed-in person. Only for screens under the signed-in layout, whose loader has already
 * put "me" in the cache, so this never suspends in practice.
 */
export function useMe(): Me {
  return useSuspenseQuery(meQueryOptions()).data;
}

export function hasRole(me: Pick<Me, 'role'>, roles: readonly Role[]): boolean {
  return roles.includes(me.role);
}
