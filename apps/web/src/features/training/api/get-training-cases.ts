// GET /api/training/cases: the cases the lead has marked for training, withdrawn ones too.
import { trainingCasesResponseSchema } from '@heatpath/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { trainingKeys } from '../../../lib/query-keys';

export function getTrainingCases(signal?: AbortSignal) {
  return apiRequest('/api/training/cases', trainingCasesResponseSchema, { signal });
}

export function trainingCasesQueryOptions() {
  return queryOptions({
    queryKey: trainingKeys.cases(),
    queryFn: ({ signal }) => getTrainingCases(signal),
  });
}

export function useTrainingCases() {
  return useQuery(trainingCasesQueryOptions());
}
