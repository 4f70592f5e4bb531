// GET /api/cases: the workshop's cases, newest first, one keyset page at a time. Its key is the
// root every case mutation invalidates, so lists and case pages refresh together.
import { caseListSchema, type CaseListFilters } from '@heatpath/contracts';
import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { casesKeys } from '../../../lib/query-keys';

// The keys live with every other feature's; re-exported for the screens that import them here.
export { casesKeys };
export type { CaseListFilters };

const pageSize = 20;

export function getCases(filters: CaseListFilters, cursor: string | null, signal?: AbortSignal) {
  const params = new URLSearchParams({ scope: filters.scope, limit: String(pageSize) });
  if (filters.status) params.set('status', filters.status);
  if (filters.technicianId) params.set('technicianId', filters.technicianId);
  if (filters.q) params.set('q', filters.q);
  if (cursor) params.set('cursor', cursor);
  return apiRequest(`/api/cases?${params.toString()}`, caseListSchema, { signal });
}

export function casesQueryOptions(filters: CaseListFilters) {
  return infiniteQueryOptions({
    queryKey: casesKeys.list(filters),
    queryFn: ({ pageParam, signal }) => getCases(filters, pageParam, signal),
    initialPageParam: null as string | null,
    getNextPageParam: (lastPage) => lastPage.nextCursor,
  });
}

export function useCases(filters: CaseListFilters) {
  return useInfiniteQuery(casesQueryOptions(filters));
}
