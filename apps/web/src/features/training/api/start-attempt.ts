// POST /api/training/cases/:trainingCaseId/attempts: a new scored attempt at a training case
// ("Predict, then see", and "Try again" after one is finished).
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { trainingKeys } from './keys';
import { attemptSchema } from './response-schemas';

export function startAttempt(trainingCaseId: string) {
  return apiRequest(
    `/api/training/cases/${encodeURIComponent(trainingCaseId)}/attempts`,
    attemptSchema,
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
