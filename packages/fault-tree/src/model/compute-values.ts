// Adds the computed values that can be worked out from a set of readings. A value whose readings
// are not all there yet, or whose function has no figure for them, is simply left out.
import type { FormulaScope } from '../formula/formula-value.js';
import { runEvaluator } from '../formula/formula-value.js';
import type { ComputedEntry } from './formula-model.js';

export function withComputedValues(
  computed: readonly ComputedEntry[],
  readings: FormulaScope,
): Record<string, number> {
  const values: Record<string, number> = { ...readings };
  for (const entry of computed) {
    if (!entry.formula.names.every((name) => Object.hasOwn(values, name))) {
      continue;
    }
    const result = runEvaluator(entry.formula.evaluate, values);
    if (result.ok && typeof result.value === 'number') {
      values[entry.value.name] = Number(result.value.toPrecision(12));
    }
  }
  return values;
}
