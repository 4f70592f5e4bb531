// Produces acceptable answers for whatever node a walk is at, driven by a supplied source of
// numbers in [0, 1), so property tests and the benchmark can walk any tree. Not public API.
import type { CompiledTree } from '../compile/compile-tree.js';
import { fromCanonical } from '../units/convert-units.js';
import { quantityInfo } from '../units/quantities.js';
import type { Reading, WalkEvent } from '../walk/walk-events.js';
import type { WalkSnapshot } from '../walk/walk-view.js';
import { currentNodeIdOf } from '../walk/walk-view.js';

export type RandomSource = () => number;

function pick<T>(items: readonly T[], random: RandomSource): T | undefined {
  return items[Math.floor(random() * items.length)];
}

/** An answer the current node accepts, or undefined at an outcome. */
export function randomAnswer(
  tree: CompiledTree,
  snapshot: WalkSnapshot,
  random: RandomSource,
): WalkEvent | undefined {
  const nodeId = currentNodeIdOf(snapshot);
  const node = tree.nodes.get(nodeId);
  const position = snapshot.context.history.length;
  switch (node?.kind) {
    case 'question': {
      const choice = pick(node.choices, random);
      return choice && { type: 'answer.choice', nodeId, position, choiceId: choice.id };
    }
    case 'procedure':
      return {
        type: 'answer.procedure',
        nodeId,
        position,
        result: random() < 0.7 ? 'done' : 'could-not-do',
      };
    case 'measurement': {
      const readings: Record<string, Reading> = {};
      for (const input of node.inputs) {
        // Keep clear of the range ends so rounding the typed value cannot push it outside.
        const share = 0.0005 + random() * 0.999;
        const canonical = input.range.min + share * (input.range.max - input.range.min);
        const unit = pick(quantityInfo[input.quantity].entryUnits, random) ?? input.unit;
        const typed = fromCanonical(canonical, unit, input.quantity);
        readings[input.name] = { value: Number(typed.toFixed(6)), unit };
      }
      return { type: 'answer.measurement', nodeId, position, readings };
    }
    default:
      return undefined;
  }
}
