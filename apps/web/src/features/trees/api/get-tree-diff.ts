// GET /api/trees/:treeId/diff?from=&to=: nodes added, removed and changed between two versions,
// with the changed fields before and after in words.
import { treeDiffResponseSchema } from '@heatpath/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { treesKeys } from '../../../lib/query-keys';

export function getTreeDiff(treeId: string, from: string, to: string, signal?: AbortSignal) {
  const query = new URLSearchParams({ from, to });
  return apiRequest(
    `/api/trees/${encodeURIComponent(treeId)}/diff?${query}`,
    treeDiffResponseSchema,
    {
      signal,
    },
  );
}

export function treeDiffQueryOptions(treeId: string, from: string, to: string) {
  return queryOptions({
    queryKey: treesKeys.diff(treeId, from, to),
    queryFn: ({ signal }) => getTreeDiff(treeId, from, to, signal),
  });
}

export function useTreeDiff(treeId: string, from: string, to: string) {
  return useQuery({ ...treeDiffQueryOptions(treeId, from, to), enabled: Boolean(from && to) });
}
