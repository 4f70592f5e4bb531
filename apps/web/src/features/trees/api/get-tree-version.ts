// GET /api/trees/:treeId/versions/:versionId: one version with its definition, and the address
// of its export download. Published versions never change, so the answer is kept.
import { treeVersionDetailSchema } from '@heatpath/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { treesKeys } from '../../../lib/query-keys';

function versionPath(treeId: string, versionId: string): string {
  return `/api/trees/${encodeURIComponent(treeId)}/versions/${encodeURIComponent(versionId)}`;
}

/** GET …/export: the definition as a `.heatpath-tree.json` download (a plain link, not a fetch). */
export function treeVersionExportPath(treeId: string, versionId: string): string {
  return `${versionPath(treeId, versionId)}/export`;
}

export function getTreeVersion(treeId: string, versionId: string, signal?: AbortSignal) {
  return apiRequest(versionPath(treeId, versionId), treeVersionDetailSchema, { signal });
}

export function treeVersionQueryOptions(treeId: string, versionId: string) {
  return queryOptions({
    queryKey: treesKeys.version(treeId, versionId),
    queryFn: ({ signal }) => getTreeVersion(treeId, versionId, signal),
  });
}

export function useTreeVersion(treeId: string, versionId: string) {
  return useQuery({ ...treeVersionQueryOptions(treeId, versionId), enabled: Boolean(versionId) });
}
