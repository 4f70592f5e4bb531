// POST /api/trees/:treeId/draft: a new draft (the next version number) copied from the latest
// version or a chosen one. 409 when a draft is already open.
import { treeVersionDetailSchema } from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { treesKeys } from '../../../lib/query-keys';

export interface StartDraftInput {
  treeId: string;
  fromVersionId?: string;
}

export function startDraft({ treeId, fromVersionId }: StartDraftInput) {
  return apiRequest(`/api/trees/${encodeURIComponent(treeId)}/draft`, treeVersionDetailSchema, {
    method: 'POST',
    body: fromVersionId ? { fromVersionId } : {},
  });
}

export function useStartDraft() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: startDraft,
    onSuccess: (draft, { treeId }) => {
      queryClient.setQueryData(treesKeys.draft(treeId), draft);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: treesKeys.library() }),
        queryClient.invalidateQueries({ queryKey: treesKeys.detail(treeId) }),
      ]);
    },
  });
}
