// POST /api/trees/:treeId/versions/:versionId/retire: a published version takes no new cases;
// cases already pinned to it keep it.
import { treeVersionDetailSchema } from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { treesKeys } from '../../../lib/query-keys';

export interface RetireVersionInput {
  treeId: string;
  versionId: string;
}

export function retireVersion({ treeId, versionId }: RetireVersionInput) {
  return apiRequest(
    `/api/trees/${encodeURIComponent(treeId)}/versions/${encodeURIComponent(versionId)}/retire`,
    treeVersionDetailSchema,
    { method: 'POST' },
  );
}

export function useRetireVersion() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: retireVersion,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: treesKeys.all }),
  });
}
