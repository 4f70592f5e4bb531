// POST /api/trees: a new tree from scratch, as a copy of another, or from an imported definition
// file. Every way starts the tree as draft version 1; an imported file with problems is kept and
// its problems come back with the draft.
import { createTreeResponseSchema, type CreateTreeRequest } from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { treesKeys } from '../../../lib/query-keys';

export function createTree(request: CreateTreeRequest) {
  return apiRequest('/api/trees', createTreeResponseSchema, { method: 'POST', body: request });
}

export function useCreateTree() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createTree,
    onSuccess: (created) => {
      queryClient.setQueryData(treesKeys.draft(created.treeId), created.draft);
      return queryClient.invalidateQueries({ queryKey: treesKeys.library() });
    },
  });
}
