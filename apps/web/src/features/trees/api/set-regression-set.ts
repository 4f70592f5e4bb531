// PUT /api/trees/:treeId/regression-set: the diagnosed or closed cases that guard the tree; each
// is replayed before every publish.
import { regressionSetResponseSchema } from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { treesKeys } from '../../../lib/query-keys';

export interface SetRegressionSetInput {
  treeId: string;
  caseIds: string[];
}

export function setRegressionSet({ treeId, caseIds }: SetRegressionSetInput) {
  return apiRequest(
    `/api/trees/${encodeURIComponent(treeId)}/regression-set`,
    regressionSetResponseSchema,
    { method: 'PUT', body: { caseIds } },
  );
}

export function useSetRegressionSet() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: setRegressionSet,
    onSuccess: (_result, { treeId }) =>
      queryClient.invalidateQueries({ queryKey: treesKeys.detail(treeId) }),
  });
}
