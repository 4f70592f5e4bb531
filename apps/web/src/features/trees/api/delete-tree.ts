// DELETE /api/trees/:treeId: deletes a tree that was never published (the lead's; the API
// refuses a tree with a published or retired version with 409).
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequestNoContent } from '../../../lib/api-client';
import { treesKeys } from '../../../lib/query-keys';

export function deleteTree(treeId: string) {
  return apiRequestNoContent(`/api/trees/${encodeURIComponent(treeId)}`, { method: 'DELETE' });
}

export function useDeleteTree() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteTree,
    onSuccess: (_result, treeId) => {
      queryClient.removeQueries({ queryKey: treesKeys.draft(treeId) });
      return queryClient.invalidateQueries({ queryKey: treesKeys.all });
    },
  });
}
