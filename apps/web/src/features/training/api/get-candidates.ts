// GET /api/training/candidates: finished cases the lead has not marked yet, with their notes and
// photos, so the lead can choose what an apprentice will not see.
import { candidatesResponseSchema } from '@heatpath/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { trainingKeys } from '../../../lib/query-keys';

export function getCandidates(signal?: AbortSignal) {
  return apiRequest('/api/training/candidates', candidatesResponseSchema, { signal });
}

export function candidatesQueryOptions() {
  return queryOptions({
    queryKey: trainingKeys.candidates(),
    queryFn: ({ signal }) => getCandidates(signal),
  });
}

export function useCandidates() {
  return useQuery(candidatesQueryOptions());
}
