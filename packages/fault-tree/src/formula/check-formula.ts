// Formula checking for the tree editor: the names a tree offers to formulas, a check of one
// formula as the lead types it, and its value on sample readings.
import type { Quantity } from '../units/quantities.js';
import type { TreeDefinition } from '../schema/tree-schema.js';
import type { FormulaProblem } from './analyse-formula.js';
import { analyseFormula } from './analyse-formula.js';
import type { Dimension } from './dimension.js';
import { describeDimension, dimensionOfQuantity, fitsDimension } from './dimension.js';
import type { EvaluationResult, FormulaScope } from './formula-value.js';
import { runEvaluator } from './formula-value.js';
import { formulaFunctionList } from './functions.js';

/** Every name a formula in `definition` may use, with its quantity. */
export function formulaNamesOf(definition: TreeDefinition): Record<string, Quantity> {
  const names: Record<string, Quantity> = {};
  for (const node of Object.values(definition.nodes)) {
    if (node.kind !== 'measurement') continue;
    for (const input of node.inputs) names[input.name] = input.quantity;
  }
  for (const value of definition.computed) names[value.name] = value.quantity;
  return names;
}

export interface FormulaCheckOptions {
  /** The names the formula may use and their quantities (see formulaNamesOf). */
  readonly names: Readonly<Record<string, Quantity>>;
  /** What the formula must produce: a branch condition, or a computed value of a quantity. */
  readonly expect: 'condition' | Quantity;
}

export type FormulaCheck =
  | {
      readonly ok: true;
      /** "a yes/no result", "a temperature difference", … */
      readonly result: string;
      readonly namesUsed: readonly string[];
      /** Evaluates the formula on readings in canonical units; never throws. */
      readonly evaluate: (values: FormulaScope) => EvaluationResult;
    }
  | { readonly ok: false; readonly problems: readonly FormulaProblem[] };

export function checkFormula(source: string, options: FormulaCheckOptions): FormulaCheck {
  const table = new Map<string, Dimension>(
    Object.entries(options.names).map(([name, quantity]) => [name, dimensionOfQuantity(quantity)]),
  );
  const analysis = analyseFormula(source, table);
  if (!analysis.ok) {
    return analysis;
  }
  const { formula } = analysis;
  const wanted: Dimension =
    options.expect === 'condition' ? { kind: 'boolean' } : dimensionOfQuantity(options.expect);
  const fits =
    options.expect === 'condition'
      ? formula.dimension.kind === 'boolean'
      : fitsDimension(formula.dimension, wanted);
  if (!fits) {
    return {
      ok: false,
      problems: [
        {
          code: 'mismatched-units',
          message: `The formula gives ${describeDimension(formula.dimension)}, but ${describeDimension(wanted)} is needed here.`,
        },
      ],
    };
  }
  return {
    ok: true,
    result: describeDimension(formula.dimension),
    namesUsed: formula.names,
    evaluate: (values) => runEvaluator(formula.evaluate, values),
  };
}

export interface FormulaFunctionHelp {
  readonly name: string;
  readonly summary: string;
}

/** The functions formulas may call, for the editor's help. */
export function listFormulaFunctions(): FormulaFunctionHelp[] {
  return formulaFunctionList.map(({ name, summary }) => ({ name, summary }));
}
