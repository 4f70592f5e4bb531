// GET /api/training/attempts/:attemptId: one scored attempt, as far as it has gone. The step
// waiting for a prediction comes without where it led.
import { trainingAttemptSchema } from '@heatpath/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { trainingKeys } from '../../../lib/query-keys';

export function getAttempt(attemptId: string, signal?: AbortSignal) {
  return apiRequest(
    `/api/training/attempts/${encodeURIComponent(attemptId)}`,
    trainingAttemptSchema,
    {
      signal,
    },
  );
}

export function attemptQueryOptions(attemptId: string) {
  return queryOptions({
    queryKey: trainingKeys.attempt(attemptId),
    queryFn: ({ signal }) => getAttempt(attemptId, signal),
  });
}

export function useAttempt(attemptId: string) {
  return useQuery(attemptQueryOptions(attemptId));
}
