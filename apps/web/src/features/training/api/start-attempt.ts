// POST /api/training/cases/:trainingCaseId/attempts: a new scored attempt at a training case
// ("Predict, then see", and "Try again" after one is finished).
import { trainingAttemptSchema } from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { trainingKeys } from '../../../lib/query-keys';

export function startAttempt(trainingCaseId: string) {
  return apiRequest(
    `/api/training/cases/${encodeURIComponent(trainingCaseId)}/attempts`,
    trainingAttemptSchema,
    { method: 'POST' },
  );
}

export function useStartAttempt() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: startAttempt,
    onSuccess: (attempt) => {
      queryClient.setQueryData(trainingKeys.attempt(attempt.id), attempt);
      void queryClient.invalidateQueries({ queryKey: trainingKeys.casebook() });
      void queryClient.invalidateQueries({ queryKey: trainingKeys.myProgress() });
    },
  });
}
