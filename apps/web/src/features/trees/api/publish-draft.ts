// POST /api/trees/:treeId/draft/publish: publishes a clean draft with a change note. The API
// answers 409 for a stale revision, for problems, and for regression-set cases whose outcome
// would change; the last is published only when the lead confirms.
import { treeVersionDetailSchema, type PublishDraftRequest } from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { treesKeys } from '../../../lib/query-keys';

export interface PublishDraftInput {
  treeId: string;
  request: PublishDraftRequest;
}

export function publishDraft({ treeId, request }: PublishDraftInput) {
  return apiRequest(
    `/api/trees/${encodeURIComponent(treeId)}/draft/publish`,
    treeVersionDetailSchema,
    { method: 'POST', body: request },
  );
}

export function usePublishDraft() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: publishDraft,
    // The draft is now a published version. Its cached copy is dropped by the screen once it has
    // left (forgetDraft), so the screen still showing it does not fetch a draft that is gone.
    onSuccess: (_published, { treeId }) => {
      const draftKey = treesKeys.draft(treeId);
      return queryClient.invalidateQueries({
        queryKey: treesKeys.all,
        predicate: (query) => query.queryKey.join('/') !== draftKey.join('/'),
      });
    },
  });
}
