// Compact helpers for writing walks in tests: choose, measure, done, couldNotDo, back. Each
// returns the event for a node; runScript applies them in order and fails loudly on a refusal.
import type { CompiledTree } from '../compile/compile-tree.js';
import type { UnitCode } from '../units/quantities.js';
import { applyWalkEvent, startWalk } from '../walk/walk-api.js';
import type { WalkEvent } from '../walk/walk-events.js';
import type { WalkSnapshot } from '../walk/walk-view.js';

export const choose = (nodeId: string, choiceId: string): WalkEvent => ({
  type: 'answer.choice',
  nodeId,
  choiceId,
});

export const measure = (
  nodeId: string,
  readings: Record<string, readonly [number, UnitCode]>,
): WalkEvent => ({
  type: 'answer.measurement',
  nodeId,
  readings: Object.fromEntries(
    Object.entries(readings).map(([name, [value, unit]]) => [name, { value, unit }]),
  ),
});

export const done = (nodeId: string): WalkEvent => ({
  type: 'answer.procedure',
  nodeId,
  result: 'done',
});

export const couldNotDo = (nodeId: string): WalkEvent => ({
  type: 'answer.procedure',
  nodeId,
  result: 'could-not-do',
});

export const back = (nodeId: string): WalkEvent => ({ type: 'walk.back', nodeId });

export function runScript(tree: CompiledTree, events: readonly WalkEvent[]): WalkSnapshot {
  let snapshot = startWalk(tree);
  for (const [index, event] of events.entries()) {
    const result = applyWalkEvent(tree, snapshot, event);
    if (!result.ok) {
      throw new Error(
        `Event ${index} (${event.type} at ${event.nodeId}) was refused: ${result.rejection.message}`,
      );
    }
    snapshot = result.snapshot;
  }
  return snapshot;
}
