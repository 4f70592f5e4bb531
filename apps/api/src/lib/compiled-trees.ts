// Compiled trees by version id. Published versions never change (the database refuses it), so a
// compiled copy is a pure function of its id and safe to keep in any process; the cache is only
// a speed-up, never a source of truth.
import { compileTree } from '@heatpath/fault-tree';
import type { CompiledTree, TreeProblem } from '@heatpath/fault-tree';
import type { TreeVersion } from '../db/models/index';
import { AppError } from '../errors';

const cache = new Map<string, CompiledTree>();
const maxEntries = 300;

export class TreeDoesNotCompileError extends AppError {
  constructor(readonly problems: readonly TreeProblem[]) {
    super(
      'conflict',
      `This tree version has ${problems.length} problem(s) and cannot be walked: ${problems[0]?.message ?? ''}`,
    );
  }
}

/**
 * The compiled tree of a published (or retired) version by id, loading its definition only when
 * this process has not compiled it yet — the definition is the largest thing a walk request reads.
 */
export async function compiledPublishedTree(
  versionId: string,
  load: (
    id: string,
  ) => Promise<Pick<TreeVersion, 'id' | 'status' | 'definition' | 'revision'> | null>,
): Promise<CompiledTree> {
  const hit = cache.get(versionId);
  if (hit) return hit;
  const version = await load(versionId);
  if (!version) throw new Error(`tree version ${versionId} is missing`);
  return compiledTreeOf(version);
}

export function compiledTreeOf(
  version: Pick<TreeVersion, 'id' | 'status' | 'definition' | 'revision'>,
): CompiledTree {
  // Drafts change; key them by revision so an edit is never served stale.
  const key = version.status === 'draft' ? `${version.id}#${version.revision}` : version.id;
  const hit = cache.get(key);
  if (hit) {
    cache.delete(key);
    cache.set(key, hit);
    return hit;
  }
  const result = compileTree(version.definition);
  if (!result.ok) throw new TreeDoesNotCompileError(result.problems);
  cache.set(key, result.tree);
  if (cache.size > maxEntries) {
    const oldest = cache.keys().next().value;
    if (oldest !== undefined) cache.delete(oldest);
  }
  return result.tree;
}
