// POST /api/cases/:caseId/findings/approve: approves the latest revision for the repair order.
// The answer is the review as it now stands.
import { repairOrderReviewSchema } from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { casesKeys, repairOrderKeys } from '../../../lib/query-keys';

export function approveFindings({ caseId, revision }: { caseId: string; revision: number }) {
  return apiRequest(
    `/api/cases/${encodeURIComponent(caseId)}/findings/approve`,
    repairOrderReviewSchema,
    { method: 'POST', body: { revision } },
  );
}

export function useApproveFindings() {
  const queryClient = useQueryClient();
  return useMutation({
    networkMode: 'always',
    mutationFn: approveFindings,
    onSuccess: (review) => {
      queryClient.setQueryData(repairOrderKeys.detail(review.caseId), review);
      void queryClient.invalidateQueries({ queryKey: casesKeys.all });
    },
  });
}
