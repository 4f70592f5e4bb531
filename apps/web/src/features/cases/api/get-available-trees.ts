// GET /api/trees/available: the symptoms a new case can start from, each with its latest published
// version (the lead also sees trees never published). Keyed under the trees' root, so publishing,
// retiring or deleting a tree refreshes it.
import { availableTreeListSchema } from '@heatpath/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { treesKeys } from '../../../lib/query-keys';

export { treesKeys };

export function getAvailableTrees(signal?: AbortSignal) {
  return apiRequest('/api/trees/available', availableTreeListSchema, { signal });
}

export function availableTreesQueryOptions() {
  return queryOptions({
    queryKey: treesKeys.available(),
    queryFn: ({ signal }) => getAvailableTrees(signal),
    staleTime: 5 * 60_000,
  });
}

export function useAvailableTrees() {
  return useQuery(availableTreesQueryOptions());
}
