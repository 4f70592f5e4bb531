// Trees and their versions as the API returns them.
import type { TreeVersionDetail, TreeVersionInfo } from '@heatpath/contracts';
import { validateTree } from '@heatpath/fault-tree';
import type { TreeVersion, User } from '../db/models/index';

export function presentVersionInfo(
  v: TreeVersion,
  extra: { caseCount: number; publisher: User | null | undefined },
): TreeVersionInfo {
  return {
    id: v.id,
    version: v.version,
    status: v.status,
    changeNote: v.changeNote,
    publishedAt: v.publishedAt ? v.publishedAt.toISOString() : null,
    publishedBy: extra.publisher ? { id: extra.publisher.id, name: extra.publisher.name } : null,
    retiredAt: v.retiredAt ? v.retiredAt.toISOString() : null,
    revision: v.revision,
    updatedAt: v.updatedAt.toISOString(),
    caseCount: extra.caseCount,
    basedOnVersion: v.basedOnVersion ?? null,
    publishConfirmation: v.publishConfirmation ?? null,
  };
}

export function presentVersionDetail(
  v: TreeVersion,
  extra: { caseCount: number; publisher: User | null | undefined },
): TreeVersionDetail {
  return {
    ...presentVersionInfo(v, extra),
    treeId: v.treeId,
    definition: v.definition,
    problems: validateTree(v.definition),
  };
}
