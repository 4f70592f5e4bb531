// GET /api/training/cases/:trainingCaseId/replay: the case as it happened, every step revealed,
// to the outcome and the findings.
import { trainingReplaySchema } from '@heatpath/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { trainingKeys } from '../../../lib/query-keys';

export function getReplay(trainingCaseId: string, signal?: AbortSignal) {
  return apiRequest(
    `/api/training/cases/${encodeURIComponent(trainingCaseId)}/replay`,
    trainingReplaySchema,
    { signal },
  );
}

export function replayQueryOptions(trainingCaseId: string) {
  return queryOptions({
    queryKey: trainingKeys.replay(trainingCaseId),
    queryFn: ({ signal }) => getReplay(trainingCaseId, signal),
    // A finished case does not change while it is replayed.
    staleTime: 5 * 60_000,
  });
}

export function useReplay(trainingCaseId: string) {
  return useQuery(replayQueryOptions(trainingCaseId));
}
