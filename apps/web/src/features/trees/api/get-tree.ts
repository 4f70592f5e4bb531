// GET /api/trees/:treeId: one tree's library entry with its versions and its regression set.
import { treeEntryResponseSchema } from '@heatpath/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { treesKeys } from '../../../lib/query-keys';

export function getTree(treeId: string, signal?: AbortSignal) {
  return apiRequest(`/api/trees/${encodeURIComponent(treeId)}`, treeEntryResponseSchema, {
    signal,
  });
}

export function treeQueryOptions(treeId: string) {
  return queryOptions({
    queryKey: treesKeys.detail(treeId),
    queryFn: ({ signal }) => getTree(treeId, signal),
  });
}

export function useTree(treeId: string) {
  return useQuery(treeQueryOptions(treeId));
}
