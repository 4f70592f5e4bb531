// GET /api/training/casebook: the courses and training cases open to the learner — the symptom
// and difficulty, never the answer.
import { casebookSchema } from '@heatpath/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { trainingKeys } from '../../../lib/query-keys';

export function getCasebook(signal?: AbortSignal) {
  return apiRequest('/api/training/casebook', casebookSchema, { signal });
}

export function casebookQueryOptions() {
  return queryOptions({
    queryKey: trainingKeys.casebook(),
    queryFn: ({ signal }) => getCasebook(signal),
  });
}

export function useCasebook() {
  return useQuery(casebookQueryOptions());
}
