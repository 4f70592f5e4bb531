// GET /api/trees/:treeId/draft: the open draft with its revision (for optimistic saves) and the
// problems the server found in it.
import { treeVersionDetailSchema } from '@heatpath/contracts';
import { queryOptions, useQuery, type QueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { treesKeys } from '../../../lib/query-keys';

export function getDraft(treeId: string, signal?: AbortSignal) {
  return apiRequest(`/api/trees/${encodeURIComponent(treeId)}/draft`, treeVersionDetailSchema, {
    signal,
  });
}

export function draftQueryOptions(treeId: string) {
  return queryOptions({
    queryKey: treesKeys.draft(treeId),
    queryFn: ({ signal }) => getDraft(treeId, signal),
    // The editor owns the working copy once it is open; a background refetch must never replace
    // what the lead is typing. Conflicts are found by the save's revision check instead.
    staleTime: Infinity,
    refetchOnWindowFocus: false,
  });
}

export function useDraft(treeId: string) {
  return useQuery(draftQueryOptions(treeId));
}

/** Drops the cached draft once it is published or discarded, so the next visit asks again. */
export function forgetDraft(queryClient: QueryClient, treeId: string) {
  queryClient.removeQueries({ queryKey: treesKeys.draft(treeId) });
}
