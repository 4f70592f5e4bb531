// PUT /api/trees/:treeId/draft: saves the working copy with the revision it was based on. A draft
// with problems is saved as it is; a stale revision is refused with 409, never overwritten.
import { treeVersionDetailSchema } from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { treesKeys } from '../../../lib/query-keys';

export interface SaveDraftInput {
  treeId: string;
  revision: number;
  definition: unknown;
}

export function saveDraft({ treeId, revision, definition }: SaveDraftInput) {
  return apiRequest(`/api/trees/${encodeURIComponent(treeId)}/draft`, treeVersionDetailSchema, {
    method: 'PUT',
    body: { revision, definition },
  });
}

/**
 * The saved draft replaces the cached one (the editor keeps its own working copy, so nothing
 * on screen jumps); the library and the tree page are only marked stale, since their titles
 * and "saved at" times change with a save.
 */
export function useSaveDraft() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveDraft,
    // Sent even when the browser says it is offline, so a failure shows at once as "Not saved".
    networkMode: 'always',
    onSuccess: (draft, { treeId }) => {
      queryClient.setQueryData(treesKeys.draft(treeId), draft);
      void queryClient.invalidateQueries({ queryKey: treesKeys.library(), refetchType: 'none' });
      void queryClient.invalidateQueries({
        queryKey: treesKeys.detail(treeId),
        refetchType: 'none',
      });
    },
  });
}
