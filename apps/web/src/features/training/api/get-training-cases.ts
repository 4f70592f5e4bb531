// GET /api/training/cases: the cases the lead has marked for training, withdrawn ones too.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { trainingKeys } from './keys';
import { trainingCasesSchema } from './response-schemas';

export function getTrainingCases(signal?: AbortSignal) {
  return apiRequest('/api/training/cases', trainingCasesSchema, { signal });
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
