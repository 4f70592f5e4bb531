// PUT /api/cases/:caseId/findings: saves the reviewed findings as a new revision (and the photos
// chosen for the repair order). The request names the revision it edited; 409 means someone
// saved after it was opened.
import { caseDetailSchema, type UpdateFindingsRequest } from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { casesKeys, repairOrderKeys } from '../../../lib/query-keys';

export interface SaveFindingsRevisionInput {
  caseId: string;
  findings: UpdateFindingsRequest;
}

/** The answer is the whole case page; this screen reloads its own review instead. */
export function saveFindingsRevision({ caseId, findings }: SaveFindingsRevisionInput) {
  return apiRequest(`/api/cases/${encodeURIComponent(caseId)}/findings`, caseDetailSchema, {
    method: 'PUT',
    body: findings,
  });
}

export function useSaveFindingsRevision() {
  const queryClient = useQueryClient();
  return useMutation({
    networkMode: 'always',
    mutationFn: saveFindingsRevision,
    onSuccess: (_saved, { caseId }) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: repairOrderKeys.detail(caseId) }),
        queryClient.invalidateQueries({ queryKey: casesKeys.all }),
      ]),
  });
}
