// PUT /api/cases/:caseId/findings: saves the edited findings. The request names the revision it
// edited; 409 means someone saved after it was opened.
import { caseDetailSchema, type UpdateFindingsRequest } from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { casesKeys } from '../../../lib/query-keys';

export interface SaveFindingsInput {
  caseId: string;
  findings: UpdateFindingsRequest;
}

export function saveFindings({ caseId, findings }: SaveFindingsInput) {
  return apiRequest(`/api/cases/${encodeURIComponent(caseId)}/findings`, caseDetailSchema, {
    method: 'PUT',
    body: findings,
  });
}

export function useSaveFindings() {
  const queryClient = useQueryClient();
  return useMutation({
    // Fail at once when offline, so the screen can say so instead of the request waiting silently.
    networkMode: 'always',
    mutationFn: saveFindings,
    onSuccess: (detail) => {
      queryClient.setQueryData(casesKeys.detail(detail.id), detail);
      void queryClient.invalidateQueries({ queryKey: casesKeys.lists() });
    },
  });
}
