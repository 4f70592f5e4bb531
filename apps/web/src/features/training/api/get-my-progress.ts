// GET /api/training/me/progress: the apprentice's own scores, never anyone else's.
import { apprenticeProgressDetailSchema } from '@heatpath/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { trainingKeys } from '../../../lib/query-keys';

export function getMyProgress(signal?: AbortSignal) {
  return apiRequest('/api/training/me/progress', apprenticeProgressDetailSchema, { signal });
}

export function myProgressQueryOptions() {
  return queryOptions({
    queryKey: trainingKeys.myProgress(),
    queryFn: ({ signal }) => getMyProgress(signal),
  });
}

export function useMyProgress(options: { enabled?: boolean } = {}) {
  return useQuery({ ...myProgressQueryOptions(), enabled: options.enabled ?? true });
}
