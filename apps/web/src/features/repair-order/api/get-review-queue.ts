// GET /api/cases?status=diagnosed: the diagnosed cases whose repair orders the advisor reviews,
// newest first, one keyset page at a time.
import { caseListSchema } from '@heatpath/contracts';
import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { repairOrderKeys } from './get-repair-order';

const pageSize = 20;

export function getReviewQueue(q: string | undefined, cursor: string | null, signal?: AbortSignal) {
  const params = new URLSearchParams({ scope: 'workshop', status: 'diagnosed', limit: String(pageSize) });
  if (q) params.set('q', q);
  if (cursor) params.set('cursor', cursor);
  return apiRequest(`/api/cases?${params.toString()}`, caseListSchema, { signal });
}

export function reviewQueueQueryOptions(q?: string) {
  return infiniteQueryOptions({
    queryKey: [...repairOrderKeys.queue(), q ?? ''] as const,
    queryFn: ({ pageParam, signal }) => getReviewQueue(q, pageParam, signal),
    initialPageParam: null as string | null,
    getNextPageParam: (lastPage) => lastPage.nextCursor,
  });
}

export function useReviewQueue(q?: string) {
  return useInfiniteQuery(reviewQueueQueryOptions(q));
}
