// GET /api/trees: the symptoms a new case can start from, each with its latest published version.
import { availableTreeListSchema } from '@heatpath/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

export const treesKeys = {
  all: ['trees'] as const,
  available: () => [...treesKeys.all, 'available'] as const,
};

export function getAvailableTrees(signal?: AbortSignal) {
  return apiRequest('/api/trees', availableTreeListSchema, { signal });
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
