// GET /api/cases/:caseId/logs: the case's temperature logs, oldest first, without their series.
// Its key is the root of every temperature-log query of the case, so an upload refreshes them all.
import { temperatureLogListSchema } from '@heatpath/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { temperatureLogsKeys, type LogView } from '../../../lib/query-keys';

export { temperatureLogsKeys };
export type { LogView };

export function getCaseLogs(caseId: string, signal?: AbortSignal) {
  return apiRequest(`/api/cases/${encodeURIComponent(caseId)}/logs`, temperatureLogListSchema, {
    signal,
  });
}

export function caseLogsQueryOptions(caseId: string) {
  return queryOptions({
    queryKey: temperatureLogsKeys.list(caseId),
    queryFn: ({ signal }) => getCaseLogs(caseId, signal),
  });
}

export function useCaseLogs(caseId: string) {
  return useQuery(caseLogsQueryOptions(caseId));
}
