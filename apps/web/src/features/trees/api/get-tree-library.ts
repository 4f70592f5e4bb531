// GET /api/trees: the workshop's trees with their published versions, the open draft and how many
// cases used each version. Its key is the root every tree mutation invalidates; the cases
// feature's "available trees" sit under the same root, so a publish refreshes them too.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { treeLibrarySchema } from './response-schemas';

export const treesKeys = {
  all: ['trees'] as const,
  library: () => [...treesKeys.all, 'library'] as const,
  tree: (treeId: string) => [...treesKeys.all, 'tree', treeId] as const,
  detail: (treeId: string) => [...treesKeys.tree(treeId), 'detail'] as const,
  draft: (treeId: string) => [...treesKeys.tree(treeId), 'draft'] as const,
  version: (treeId: string, versionId: string) =>
    [...treesKeys.tree(treeId), 'version', versionId] as const,
  diff: (treeId: string, from: string, to: string) =>
    [...treesKeys.tree(treeId), 'diff', from, to] as const,
};

export function getTreeLibrary(signal?: AbortSignal) {
  return apiRequest('/api/trees', treeLibrarySchema, { signal });
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
