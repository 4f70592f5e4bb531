// GET /api/cases/:caseId/logs: the case's temperature logs, oldest first, without their series.
// Its key is the root of every temperature-log query of the case, so an upload refreshes them all.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { logListSchema } from './response-schemas';

export const temperatureLogsKeys = {
  all: ['temperature-logs'] as const,
  ofCase: (caseId: string) => [...temperatureLogsKeys.all, caseId] as const,
  list: (caseId: string) => [...temperatureLogsKeys.ofCase(caseId), 'list'] as const,
  details: (caseId: string) => [...temperatureLogsKeys.ofCase(caseId), 'detail'] as const,
  detail: (caseId: string, logId: string, view: LogView) =>
    [...temperatureLogsKeys.details(caseId), logId, view] as const,
};

/** What the chart asks of one log: a threshold other than the default, and a zoomed window. */
export interface LogView {
  threshold?: number | undefined;
  from?: number | undefined;
  to?: number | undefined;
}

export function getCaseLogs(caseId: string, signal?: AbortSignal) {
  return apiRequest(`/api/cases/${encodeURIComponent(caseId)}/logs`, logListSchema, { signal });
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
