// GET /api/cases/:caseId/events: the case's audit trail (who did what, when). Keyed under the
// case, so every change to the case refreshes it too; fetched only while it is shown.
import { caseEventsResponseSchema } from '@heatpath/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { casesKeys } from '../../../lib/query-keys';

export const caseEventsKey = casesKeys.events;

export function getCaseEvents(caseId: string, signal?: AbortSignal) {
  return apiRequest(`/api/cases/${encodeURIComponent(caseId)}/events`, caseEventsResponseSchema, {
    signal,
  });
}

export function caseEventsQueryOptions(caseId: string) {
  return queryOptions({
    queryKey: caseEventsKey(caseId),
    queryFn: ({ signal }) => getCaseEvents(caseId, signal),
  });
}

export function useCaseEvents(caseId: string, enabled: boolean) {
  return useQuery({ ...caseEventsQueryOptions(caseId), enabled });
}
