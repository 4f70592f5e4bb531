// The checked formulas of a tree, as validation leaves them for the walk: every input by name,
// the computed values in an order where each comes after what it uses, and each measurement's
// branch conditions.
import type { AnalysedFormula } from '../formula/analyse-formula.js';
import type { ComputedValue, MeasurementInput } from '../schema/tree-schema.js';

export interface InputEntry {
  readonly nodeId: string;
  readonly index: number;
  readonly input: MeasurementInput;
}

export interface ComputedEntry {
  readonly index: number;
  readonly value: ComputedValue;
  readonly formula: AnalysedFormula;
  /** The readings this value is ultimately computed from. */
  readonly inputs: readonly string[];
}

export interface FormulaModel {
  readonly inputs: ReadonlyMap<string, InputEntry>;
  readonly computed: readonly ComputedEntry[];
  /** Per measurement node, its branch conditions in order; undefined where one did not check out. */
  readonly branches: ReadonlyMap<string, readonly (AnalysedFormula | undefined)[]>;
}
