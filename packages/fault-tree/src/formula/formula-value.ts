// What evaluating a checked formula produces, and the tolerant comparisons it uses. Comparisons
// follow mathjs's default relative tolerance so that a computed 100.7 − 90.4 meets `>= 10.3`.

export type FormulaValue = number | boolean;
export type FormulaScope = Readonly<Record<string, number>>;
export type Evaluator = (scope: FormulaScope) => FormulaValue;

/** Thrown while evaluating when a name has no value yet; caught by evaluateFormula. */
export class MissingValueError extends Error {
  override readonly name = 'MissingValueError';
  readonly valueName: string;

  constructor(valueName: string) {
    super(`No value for ${valueName} yet.`);
    this.valueName = valueName;
  }
}

const RELATIVE_TOLERANCE = 1e-12;
const ABSOLUTE_TOLERANCE = 1e-15;

export function nearlyEqual(a: number, b: number): boolean {
  if (a === b) {
    return true;
  }
  if (!Number.isFinite(a) || !Number.isFinite(b)) {
    return false;
  }
  const difference = Math.abs(a - b);
  return (
    difference <= ABSOLUTE_TOLERANCE ||
    difference <= RELATIVE_TOLERANCE * Math.max(Math.abs(a), Math.abs(b))
  );
}

export function compareValues(op: string, a: FormulaValue, b: FormulaValue): boolean {
  if (typeof a === 'boolean' || typeof b === 'boolean') {
    return op === 'equal' ? a === b : a !== b;
  }
  switch (op) {
    case 'smaller':
      return a < b && !nearlyEqual(a, b);
    case 'larger':
      return a > b && !nearlyEqual(a, b);
    case 'smallerEq':
      return a < b || nearlyEqual(a, b);
    case 'largerEq':
      return a > b || nearlyEqual(a, b);
    case 'equal':
      return nearlyEqual(a, b);
    default:
      return !nearlyEqual(a, b);
  }
}

export function asNumber(value: FormulaValue): number {
  return typeof value === 'number' ? value : Number.NaN;
}

export type EvaluationResult =
  | { readonly ok: true; readonly value: FormulaValue }
  | { readonly ok: false; readonly reason: string; readonly missing?: string };

/** Runs an evaluator without ever throwing: a missing value or a function with no figure is reported. */
export function runEvaluator(evaluate: Evaluator, scope: FormulaScope): EvaluationResult {
  try {
    const value = evaluate(scope);
    if (typeof value === 'number' && !Number.isFinite(value)) {
      return { ok: false, reason: 'The formula has no finite value for these readings.' };
    }
    return { ok: true, value };
  } catch (error) {
    if (error instanceof MissingValueError) {
      return { ok: false, reason: error.message, missing: error.valueName };
    }
    return { ok: false, reason: error instanceof Error ? error.message : String(error) };
  }
}
