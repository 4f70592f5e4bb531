// The case's pinned tree, compiled in the browser with the same fault-tree package the API uses,
// so computed values and range checks show as readings are typed and agree with the server.
// Only the case page loads this module (it brings mathjs and XState), and a published version
// never changes, so each version is compiled once per page load and kept.
import type { CaseDetail } from '@heatpath/contracts';
import {
  compileTree,
  replayWalk,
  type CompiledTree,
  type WalkSnapshot,
} from '@heatpath/fault-tree';
import { useMemo } from 'react';

const compiledByVersion = new Map<string, CompiledTree | null>();

export function compiledTreeFor(versionId: string, definition: unknown): CompiledTree | null {
  const known = compiledByVersion.get(versionId);
  if (known !== undefined) return known;
  const result = compileTree(definition);
  const tree = result.ok ? result.tree : null;
  compiledByVersion.set(versionId, tree);
  return tree;
}

export interface WalkModel {
  tree: CompiledTree;
  /** The walk rebuilt from the server's history: where live previews start from. */
  snapshot: WalkSnapshot;
}

/**
 * The compiled tree and the walk's state, or null when the browser cannot rebuild it (a tree that
 * does not compile, or a history that does not replay). Answering still works without it; only
 * the live preview is missing, and the server checks every answer anyway.
 */
export function useWalkModel(detail: CaseDetail): WalkModel | null {
  const { versionId, definition } = detail.tree;
  const history = detail.walk.history;
  const tree = useMemo(() => compiledTreeFor(versionId, definition), [versionId, definition]);
  return useMemo(() => {
    if (!tree) return null;
    const replay = replayWalk(tree, history);
    return replay.divergence ? null : { tree, snapshot: replay.snapshot };
  }, [tree, history]);
}
