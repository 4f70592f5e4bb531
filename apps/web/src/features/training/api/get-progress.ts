// GET /api/training/progress (every apprentice, for the lead) and
// GET /api/training/progress/:apprenticeId (one apprentice with every attempt).
import { apprenticeProgressDetailSchema, progressListResponseSchema } from '@heatpath/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { trainingKeys } from '../../../lib/query-keys';

export function getProgress(signal?: AbortSignal) {
  return apiRequest('/api/training/progress', progressListResponseSchema, { signal });
}

export function progressQueryOptions() {
  return queryOptions({
    queryKey: trainingKeys.progress(),
    queryFn: ({ signal }) => getProgress(signal),
  });
}

export function useProgress() {
  return useQuery(progressQueryOptions());
}

export function getApprenticeProgress(apprenticeId: string, signal?: AbortSignal) {
  return apiRequest(
    `/api/training/progress/${encodeURIComponent(apprenticeId)}`,
    apprenticeProgressDetailSchema,
    { signal },
  );
}

export function apprenticeProgressQueryOptions(apprenticeId: string) {
  return queryOptions({
    queryKey: trainingKeys.progressOf(apprenticeId),
    queryFn: ({ signal }) => getApprenticeProgress(apprenticeId, signal),
  });
}

export function useApprenticeProgress(apprenticeId: string) {
  return useQuery(apprenticeProgressQueryOptions(apprenticeId));
}
