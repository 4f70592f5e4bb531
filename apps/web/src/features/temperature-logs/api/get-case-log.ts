// GET /api/cases/:caseId/logs/:logId: one log with its analysis, candidate readings and the chart's
// readings (at most 2,000, thinned keeping each stretch's extremes). A new threshold or zoom
// window is a new query; the previous answer stays on screen until it arrives.
import { temperatureLogDetailSchema } from '@heatpath/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { temperatureLogsKeys, type LogView } from '../../../lib/query-keys';

export function getCaseLog(caseId: string, logId: string, view: LogView, signal?: AbortSignal) {
  const params = new URLSearchParams();
  if (view.threshold !== undefined) params.set('threshold', String(view.threshold));
  if (view.from !== undefined) params.set('from', String(Math.floor(view.from)));
  if (view.to !== undefined) params.set('to', String(Math.ceil(view.to)));
  const query = params.size > 0 ? `?${params.toString()}` : '';
  return apiRequest(
    `/api/cases/${encodeURIComponent(caseId)}/logs/${encodeURIComponent(logId)}${query}`,
    temperatureLogDetailSchema,
    { signal },
  );
}

export function caseLogQueryOptions(caseId: string, logId: string, view: LogView = {}) {
  return queryOptions({
    queryKey: temperatureLogsKeys.detail(caseId, logId, view),
    queryFn: ({ signal }) => getCaseLog(caseId, logId, view, signal),
    // A stored log never changes unless its mapping does, which invalidates it.
    staleTime: 5 * 60_000,
  });
}

export function useCaseLog(caseId: string, logId: string | null, view: LogView) {
  return useQuery({
    ...caseLogQueryOptions(caseId, logId ?? '', view),
    enabled: logId !== null,
    placeholderData: keepPreviousData,
  });
}
