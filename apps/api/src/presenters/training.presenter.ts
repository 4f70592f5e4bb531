// The training area's answers, shaped from loaded records (no database reads here).
import type { TreeVersion } from '../db/models/index';

/** The tree version a training case was walked on, as a learner reads it. */
export function presentTrainingTree(version: TreeVersion) {
  return { version: version.version, status: version.status, definition: version.definition };
}
