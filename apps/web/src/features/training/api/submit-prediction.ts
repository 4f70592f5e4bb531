// POST /api/training/attempts/:attemptId/predictions: the learner's prediction for the current
// step. The answer is the attempt with that step revealed and scored; a 409 means the step was
// already predicted (another tab), so the attempt is fetched again.
import { trainingAttemptSchema, type PredictionRequest } from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest, isApiError } from '../../../lib/api-client';
import { trainingKeys } from '../../../lib/query-keys';

export interface SubmitPredictionInput {
  attemptId: string;
  prediction: PredictionRequest;
}

export function submitPrediction({ attemptId, prediction }: SubmitPredictionInput) {
  return apiRequest(
    `/api/training/attempts/${encodeURIComponent(attemptId)}/predictions`,
    trainingAttemptSchema,
    { method: 'POST', body: prediction },
  );
}

export function useSubmitPrediction() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: submitPrediction,
    onSuccess: (attempt) => {
      queryClient.setQueryData(trainingKeys.attempt(attempt.id), attempt);
      if (attempt.status === 'finished') {
        void queryClient.invalidateQueries({ queryKey: trainingKeys.casebook() });
        void queryClient.invalidateQueries({ queryKey: trainingKeys.myProgress() });
      }
    },
    onError: (error, { attemptId }) => {
      if (isApiError(error) && error.code === 'conflict')
        void queryClient.invalidateQueries({ queryKey: trainingKeys.attempt(attemptId) });
    },
  });
}
