// POST /api/training/cases: mark a finished case for training. A 409 means it is marked already
// or no longer finished; the form shows the API's sentence.
import { trainingCaseSummarySchema, type MarkTrainingCaseRequest } from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { trainingKeys } from '../../../lib/query-keys';

export function markTrainingCase(body: MarkTrainingCaseRequest) {
  return apiRequest('/api/training/cases', trainingCaseSummarySchema, { method: 'POST', body });
}

export function useMarkTrainingCase() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: markTrainingCase,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: trainingKeys.all }),
  });
}
