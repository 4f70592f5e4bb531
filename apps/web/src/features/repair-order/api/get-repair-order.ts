// GET /api/cases/:caseId/findings/review: a diagnosed case's repair order — every revision of
// its findings with who changed what, the photos to choose from, and what was sent. Its key is
// the root every repair-order mutation invalidates.
import { repairOrderReviewSchema } from '@heatpath/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { repairOrderKeys } from '../../../lib/query-keys';

export { repairOrderKeys };

export function getRepairOrder(caseId: string, signal?: AbortSignal) {
  return apiRequest(
    `/api/cases/${encodeURIComponent(caseId)}/findings/review`,
    repairOrderReviewSchema,
    { signal },
  );
}

export function repairOrderQueryOptions(caseId: string) {
  return queryOptions({
    queryKey: repairOrderKeys.detail(caseId),
    queryFn: ({ signal }) => getRepairOrder(caseId, signal),
  });
}

/** While a send is waiting, look again every few seconds so its status stays true. */
export function useRepairOrder(caseId: string) {
  return useQuery({
    ...repairOrderQueryOptions(caseId),
    refetchInterval: (query) =>
      query.state.data?.sends.some((s) => s.status === 'queued' || s.status === 'sending')
        ? 3000
        : false,
  });
}

/** Where an approved revision downloads from (the browser saves it: Content-Disposition). */
export function exportUrl(caseId: string, format: 'pdf' | 'csv' | 'json', revision: number) {
  return `/api/cases/${encodeURIComponent(caseId)}/findings/export/${format}?revision=${revision}`;
}
