// The readings a formula ultimately depends on, looking through computed values.
import type { AnalysedFormula } from '../formula/analyse-formula.js';
import type { FormulaModel } from './formula-model.js';

export function baseInputsOf(formula: AnalysedFormula, model: FormulaModel): string[] {
  const result = new Set<string>();
  for (const name of formula.names) {
    if (model.inputs.has(name)) {
      result.add(name);
      continue;
    }
    const computed = model.computed.find((entry) => entry.value.name === name);
    for (const input of computed?.inputs ?? []) {
      result.add(input);
    }
  }
  return [...result];
}
