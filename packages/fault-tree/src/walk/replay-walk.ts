// Rebuilds a walk from its recorded events. The server trusts this, not the client: the stored
// events on the case's pinned tree are the walk. An event that no longer fits — because the tree
// changed, or the record is damaged — stops the replay and is reported with where and why; the
// replay never throws on bad input.
import type { CompiledTree } from '../compile/compile-tree.js';
import type { RejectionCode } from './rejection.js';
import { applyWalkEvent, startWalk } from './walk-api.js';
import type { WalkSnapshot, WalkView } from './walk-view.js';
import { currentNodeIdOf, describeWalk } from './walk-view.js';

export interface Divergence {
  /** Index in the recorded events of the first event that did not fit. */
  readonly divergedAt: number;
  /** The node the walk was at when that event arrived. */
  readonly nodeId: string;
  readonly code: RejectionCode;
  readonly reason: string;
}

export interface ReplayResult {
  /** The state after the last event that fitted. */
  readonly snapshot: WalkSnapshot;
  /** How many events were applied (all of them when there is no divergence). */
  readonly applied: number;
  readonly divergence: Divergence | null;
}

export function replayWalk(tree: CompiledTree, events: readonly unknown[]): ReplayResult {
  let snapshot = startWalk(tree);
  for (const [index, event] of events.entries()) {
    const result = applyWalkEvent(tree, snapshot, event);
    if (!result.ok) {
      return {
        snapshot,
        applied: index,
        divergence: {
          divergedAt: index,
          nodeId: currentNodeIdOf(snapshot),
          code: result.rejection.code,
          reason: result.rejection.message,
        },
      };
    }
    snapshot = result.snapshot;
  }
  return { snapshot, applied: events.length, divergence: null };
}

export type WalkSummary = WalkView & {
  readonly divergence: Divergence | null;
  /** How many of the given events were applied. */
  readonly applied: number;
};

/**
 * What the API needs for a case in one call: given the tree and the stored events, where the
 * walk stands (current node, path, values, outcome) and whether the record diverged.
 */
export function summariseWalk(tree: CompiledTree, events: readonly unknown[]): WalkSummary {
  const replay = replayWalk(tree, events);
  return {
    ...describeWalk(tree, replay.snapshot),
    divergence: replay.divergence,
    applied: replay.applied,
  };
}
