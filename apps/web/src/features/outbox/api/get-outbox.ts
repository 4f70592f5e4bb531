// GET /api/outbox: every e-mail the workshop's Heatpath wrote, newest first, a keyset page at a
// time. Its key is the root the retry invalidates.
import { outboxListSchema } from '@heatpath/contracts';
import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { outboxKeys } from '../../../lib/query-keys';

export { outboxKeys };

export function getOutbox(cursor: string | null, signal?: AbortSignal) {
  const params = new URLSearchParams({ limit: '20' });
  if (cursor) params.set('cursor', cursor);
  return apiRequest(`/api/outbox?${params.toString()}`, outboxListSchema, { signal });
}

export function outboxQueryOptions() {
  return infiniteQueryOptions({
    queryKey: outboxKeys.list(),
    queryFn: ({ pageParam, signal }) => getOutbox(pageParam, signal),
    initialPageParam: null as string | null,
    getNextPageParam: (lastPage) => lastPage.nextCursor,
  });
}

/** While anything is waiting to go out, look again every few seconds. */
export function useOutbox() {
  return useInfiniteQuery({
    ...outboxQueryOptions(),
    refetchInterval: (query) =>
      query.state.data?.pages.some((page) =>
        page.messages.some((m) => m.status === 'queued' || m.status === 'sending'),
      )
        ? 3000
        : false,
  });
}
