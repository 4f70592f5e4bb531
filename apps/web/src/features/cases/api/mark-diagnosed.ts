// POST /api/cases/:caseId/diagnosed: the technician declares the finding; the case leaves the walk.
import { caseDetailSchema } from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { casesKeys } from '../../../lib/query-keys';

export function markDiagnosed(caseId: string) {
  return apiRequest(`/api/cases/${encodeURIComponent(caseId)}/diagnosed`, caseDetailSchema, {
    method: 'POST',
  });
}

export function useMarkDiagnosed() {
  const queryClient = useQueryClient();
  return useMutation({
    // Fail at once when offline, so the screen can say so instead of the request waiting silently.
    networkMode: 'always',
    mutationFn: markDiagnosed,
    onSuccess: (detail) => {
      queryClient.setQueryData(casesKeys.detail(detail.id), detail);
      void queryClient.invalidateQueries({ queryKey: casesKeys.lists() });
    },
  });
}
