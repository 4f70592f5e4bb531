// DELETE /api/trees/:treeId/draft: throws the open draft away (not the tree's only version).
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequestNoContent } from '../../../lib/api-client';
import { treesKeys } from '../../../lib/query-keys';

export function discardDraft(treeId: string) {
  return apiRequestNoContent(`/api/trees/${encodeURIComponent(treeId)}/draft`, {
    method: 'DELETE',
  });
}

export function useDiscardDraft() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: discardDraft,
    onSuccess: (_result, treeId) => {
      queryClient.removeQueries({ queryKey: treesKeys.draft(treeId) });
      return queryClient.invalidateQueries({ queryKey: treesKeys.all });
    },
  });
}
