// The case's pinned tree, compiled in the browser with the same fault-tree package the API uses:
// the case page walks it here (hooks/use-local-walk.ts), so the next step shows the moment an
// answer is given, and readings are checked and worked out as they are typed. Only the case page
// loads this module (it brings mathjs and XState), and a published version never changes, so
// each version is compiled once per page load and kept.
import type { CaseDetail } from '@heatpath/contracts';
import { compileTree, type CompiledTree } from '@heatpath/fault-tree';
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

/** The case's tree, compiled once per version; null when it does not compile here. */
export function useCaseTree(detail: CaseDetail): CompiledTree | null {
  const { versionId, definition } = detail.tree;
  return useMemo(() => compiledTreeFor(versionId, definition), [versionId, definition]);
}
