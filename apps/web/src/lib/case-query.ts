// GET /api/cases/:caseId: everything the case page shows. The walk in it is rebuilt by the API from
// the stored answers on every request, so this one query is also how a case resumes on any device.
// Shared: the case page walks it and training reads a case's notes and photos from it.
import { caseDetailSchema } from '@heatpath/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from './api-client';
import { casesKeys } from './query-keys';

export function getCase(caseId: string, signal?: AbortSignal) {
  return apiRequest(`/api/cases/${encodeURIComponent(caseId)}`, caseDetailSchema, { signal });
}

export function caseQueryOptions(caseId: string) {
  return queryOptions({
    queryKey: casesKeys.detail(caseId),
    queryFn: ({ signal }) => getCase(caseId, signal),
  });
}

export function useCase(caseId: string) {
  return useQuery(caseQueryOptions(caseId));
}
