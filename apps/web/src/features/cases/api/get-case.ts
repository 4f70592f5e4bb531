// GET /api/cases/:caseId: everything the case page shows. The walk in it is rebuilt by the API from
// the stored answers on every request, so this one query is also how a case resumes on any device.
import { caseDetailSchema } from '@heatpath/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { casesKeys } from '../../../lib/query-keys';

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
