// POST /api/trees/:treeId/draft/regression: replays the recorded answers of every finished case
// of the tree against the draft. A POST because the server compiles the draft for it, but it
// changes nothing; the report is kept as the mutation's result while the screen is open.
import { regressionReportSchema } from '@heatpath/contracts';
import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

export function replayRegression(treeId: string) {
  return apiRequest(
    `/api/trees/${encodeURIComponent(treeId)}/draft/regression`,
    regressionReportSchema,
    { method: 'POST' },
  );
}

export function useReplayRegression() {
  return useMutation({ mutationFn: replayRegression });
}
