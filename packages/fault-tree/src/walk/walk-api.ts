// Pure functions over a compiled tree's machine: start a walk, check an answer, apply it, preview
// readings as they are typed. Snapshots are XState machine snapshots; nothing here keeps state,
// so the server can rebuild a walk from stored events on any process.
import { initialTransition, transition } from 'xstate';
import type { CompiledTree } from '../compile/compile-tree.js';
import { withComputedValues } from '../model/compute-values.js';
import type { AnswerRejection } from './rejection.js';
import { rejection } from './rejection.js';
import { checkReadings } from './check-readings.js';
import { resolveEvent } from './resolve-answer.js';
import type { RouteKey } from './walk-context.js';
import { readingsOnPath } from './walk-context.js';
import type { Reading, WalkEvent } from './walk-events.js';
import { walkEventSchema } from './walk-events.js';
import type { ComputedView, WalkSnapshot } from './walk-view.js';
import { computedViews, currentNodeIdOf } from './walk-view.js';

export type AnswerCheck =
  | {
      readonly ok: true;
      /** The event as parsed; store this one. */
      readonly event: WalkEvent;
      readonly toNodeId: string;
      /** How the answer leaves the node; absent for a step back. */
      readonly route?: RouteKey;
      /** Canonical values after the event. */
      readonly values: Readonly<Record<string, number>>;
    }
  | { readonly ok: false; readonly rejection: AnswerRejection };

export type ApplyResult =
  | { readonly ok: true; readonly snapshot: WalkSnapshot; readonly event: WalkEvent }
  | { readonly ok: false; readonly snapshot: WalkSnapshot; readonly rejection: AnswerRejection };

export interface ReadingsPreview {
  /** Computed values with the readings typed so far (null where not yet computable). */
  readonly computed: readonly ComputedView[];
  /** Per input name, what is wrong with what was typed; missing readings are not listed. */
  readonly fields: Readonly<Record<string, string>>;
  /** Where the answer would lead if submitted now; absent while readings are missing or wrong. */
  readonly toNodeId?: string;
}

/** The snapshot of a walk that has just begun at the tree's start node. */
export function startWalk(tree: CompiledTree): WalkSnapshot {
  const [snapshot] = initialTransition(tree.machine);
  return snapshot;
}

/** Whether `event` (any value, e.g. a request body) is acceptable now, and where it would lead. Never throws. */
export function checkAnswer(
  tree: CompiledTree,
  snapshot: WalkSnapshot,
  event: unknown,
): AnswerCheck {
  const nodeId = currentNodeIdOf(snapshot);
  const parsed = walkEventSchema.safeParse(event);
  if (!parsed.success) {
    const detail = parsed.error.issues[0];
    const where = detail && detail.path.length > 0 ? ` at "${detail.path.join('.')}"` : '';
    return {
      ok: false,
      rejection: rejection(
        'malformed-event',
        nodeId,
        `The answer is not in the expected form${where}: ${detail?.message ?? 'unknown problem'}.`,
      ),
    };
  }
  const resolution = resolveEvent(tree, nodeId, snapshot.context, parsed.data);
  if (!resolution.ok) {
    return resolution;
  }
  return {
    ok: true,
    event: parsed.data,
    toNodeId: resolution.to,
    ...(resolution.kind === 'answer' ? { route: resolution.route } : {}),
    values: resolution.values,
  };
}

/** Thrown only if the machine and the answer checker disagree — a bug in Heatpath, never bad input. */
export class WalkInvariantError extends Error {
  override readonly name = 'WalkInvariantError';
}

/** Applies `event` if it is acceptable; otherwise returns the unchanged snapshot and the reason. */
export function applyWalkEvent(
  tree: CompiledTree,
  snapshot: WalkSnapshot,
  event: unknown,
): ApplyResult {
  const check = checkAnswer(tree, snapshot, event);
  if (!check.ok) {
    return { ok: false, snapshot, rejection: check.rejection };
  }
  const [next] = transition(tree.machine, snapshot, check.event);
  if (
    currentNodeIdOf(next) !== check.toNodeId ||
    next.context.history.length !== snapshot.context.history.length + 1
  ) {
    throw new WalkInvariantError(
      `The walk machine went to "${currentNodeIdOf(next)}" where the answer check expected "${check.toNodeId}".`,
    );
  }
  return { ok: true, snapshot: next, event: check.event };
}

/** Live feedback while readings are typed: computed values, per-box problems and where it would lead. */
export function previewReadings(
  tree: CompiledTree,
  snapshot: WalkSnapshot,
  readings: Readonly<Record<string, Reading>>,
): ReadingsPreview {
  const nodeId = currentNodeIdOf(snapshot);
  const node = tree.nodes.get(nodeId);
  if (node?.kind !== 'measurement') {
    return { computed: computedViews(tree, snapshot.context.values), fields: {} };
  }
  const checked = checkReadings(node, readings, true);
  const fields = Object.fromEntries(checked.problems.map((p) => [p.input, p.message]));
  const values = withComputedValues(tree.formulas.computed, {
    ...readingsOnPath(snapshot.context.path),
    ...checked.canonical,
  });
  const complete = checkAnswer(tree, snapshot, {
    type: 'answer.measurement',
    nodeId,
    readings,
  });
  return {
    computed: computedViews(tree, values),
    fields,
    ...(complete.ok ? { toNodeId: complete.toNodeId } : {}),
  };
}
