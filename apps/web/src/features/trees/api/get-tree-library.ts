// GET /api/trees: the workshop's trees with their published versions, the open draft and how many
// cases used each version. Its key is the root every tree mutation invalidates; the cases
// feature's "available trees" sit under the same root, so a publish refreshes them too.
import { treeLibraryResponseSchema } from '@heatpath/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { treesKeys } from '../../../lib/query-keys';

export { treesKeys };

export function getTreeLibrary(signal?: AbortSignal) {
  return apiRequest('/api/trees', treeLibraryResponseSchema, { signal });
}

export function treeLibraryQueryOptions() {
  return queryOptions({
    queryKey: treesKeys.library(),
    queryFn: ({ signal }) => getTreeLibrary(signal),
  });
}

export function useTreeLibrary() {
  return useQuery(treeLibraryQueryOptions());
}
