// Checks a formula and turns it into an evaluator. The mathjs syntax tree is walked with a
// whitelist: numbers, true/false, declared names, arithmetic, comparisons, logic, parentheses,
// `a ? b : c`, a number followed by a unit, and calls to the functions in ./functions. Anything
// else — assignment, function definition, property or index access, objects, lists, blocks,
// ranges, strings, unknown functions such as import or evaluate — is refused with a sentence
// saying why. The evaluator is built from closures over the checked tree; mathjs evaluates nothing.
import type { MathNode } from 'mathjs';
import { toCanonical } from '../units/convert-units.js';
import type { Dimension } from './dimension.js';
import {
  BOOLEAN,
  combineExponents,
  describeDimension,
  dimensionOfQuantity,
  ERROR,
  fitsDimension,
  FREE,
  isPlainNumber,
  PLAIN_NUMBER,
  quantityDimension,
  sameDimension,
  scaleExponents,
  TEMPERATURE,
} from './dimension.js';
import {
  arithmeticOperators,
  comparisonOperators,
  forbiddenFunctionNames,
  literalUnit,
  logicalOperators,
} from './formula-rules.js';
import type { Evaluator, FormulaValue } from './formula-value.js';
import { asNumber, compareValues, MissingValueError } from './formula-value.js';
import { formulaFunctionList, lookupFormulaFunction } from './functions.js';
import { parseFormulaSource } from './math-parser.js';

export type FormulaProblemCode =
  'formula-syntax' | 'formula-not-allowed' | 'unknown-name' | 'mismatched-units';

export interface FormulaProblem {
  readonly code: FormulaProblemCode;
  readonly message: string;
}

/** The names a formula may use, each with its dimension. */
export type FormulaNameTable = ReadonlyMap<string, Dimension>;

export interface AnalysedFormula {
  readonly source: string;
  readonly dimension: Dimension;
  /** Declared names the formula refers to. */
  readonly names: readonly string[];
  /** Every number written in the formula, in canonical units; validation samples around them. */
  readonly constants: readonly number[];
  readonly evaluate: Evaluator;
}

export type FormulaAnalysis =
  | { readonly ok: true; readonly formula: AnalysedFormula }
  | { readonly ok: false; readonly problems: readonly FormulaProblem[] };

interface Checked {
  readonly dimension: Dimension;
  readonly run: Evaluator;
}

// Local views of the mathjs node shapes this checker reads.
interface ConstantShape {
  readonly value: unknown;
}
interface SymbolShape {
  readonly name: string;
}
interface OperatorShape {
  readonly fn: string;
  readonly op: string;
  readonly args: readonly MathNode[];
  readonly implicit: boolean;
  readonly isPercentage?: boolean;
}
interface ParenthesisShape {
  readonly content: MathNode;
}
interface ConditionalShape {
  readonly condition: MathNode;
  readonly trueExpr: MathNode;
  readonly falseExpr: MathNode;
}
interface RelationalShape {
  readonly conditionals: readonly string[];
  readonly params: readonly MathNode[];
}
interface FunctionShape {
  readonly fn: MathNode;
  readonly args: readonly MathNode[];
}

const refusedNodeMessages: Readonly<Record<string, string>> = {
  AssignmentNode: 'Formulas cannot assign values with "="; to compare two values write "==".',
  FunctionAssignmentNode: 'Formulas cannot define functions.',
  AccessorNode:
    'Formulas cannot read properties or items of a value (with "." or "[ ]"); use the names of readings and computed values directly.',
  IndexNode: 'Formulas cannot read items of a value with "[ ]".',
  ObjectNode: 'Formulas cannot contain objects written with "{ }".',
  ArrayNode: 'Formulas cannot contain lists written with "[ ]".',
  BlockNode:
    'A formula is one expression; several expressions separated by ";" or line breaks are not allowed.',
  RangeNode:
    'Ranges written with ":" are not allowed; to test a band write, for example, 82 <= thermostatOpening <= 91.',
};

const operatorWords: Readonly<Record<string, string>> = {
  mod: 'remainder ("mod" or "%")',
  factorial: 'factorial ("!")',
  ctranspose: 'transpose ("\'")',
  transpose: 'transpose ("\'")',
  to: 'unit conversion ("to" or "in"): readings are already in canonical units',
  nullish: '"??"',
  bitAnd: 'bitwise "&"',
  bitOr: 'bitwise "|"',
  bitXor: 'bitwise "^|"',
  bitNot: 'bitwise "~"',
  leftShift: '"<<"',
  rightArithShift: '">>"',
  rightLogShift: '">>>"',
  dotMultiply: '".*"',
  dotDivide: '"./"',
  dotPow: '".^"',
};

const callable = formulaFunctionList.map((fn) => fn.name).join(', ');
const failed: Checked = { dimension: ERROR, run: () => Number.NaN };

class FormulaChecker {
  readonly problems: FormulaProblem[] = [];
  readonly names = new Set<string>();
  readonly constants: number[] = [];

  constructor(private readonly table: FormulaNameTable) {}

  refuse(message: string): Checked {
    this.problems.push({ code: 'formula-not-allowed', message });
    return failed;
  }

  mismatch(message: string): Checked {
    this.problems.push({ code: 'mismatched-units', message });
    return failed;
  }

  visit(node: MathNode): Checked {
    switch (node.type) {
      case 'ConstantNode':
        return this.constant((node as unknown as ConstantShape).value);
      case 'SymbolNode':
        return this.symbol((node as unknown as SymbolShape).name);
      case 'ParenthesisNode':
        return this.visit((node as unknown as ParenthesisShape).content);
      case 'OperatorNode':
        return this.operator(node as unknown as OperatorShape);
      case 'RelationalNode':
        return this.relational(node as unknown as RelationalShape);
      case 'ConditionalNode':
        return this.conditional(node as unknown as ConditionalShape);
      case 'FunctionNode':
        return this.call(node as unknown as FunctionShape);
      default:
        return this.refuse(
          refusedNodeMessages[node.type] ??
            `The construct "${node.type}" is not allowed in a formula.`,
        );
    }
  }

  constant(value: unknown): Checked {
    if (typeof value === 'number' && Number.isFinite(value)) {
      // The sign of "-40" is a separate operator, so keep both signs as points of interest.
      this.constants.push(value, -value);
      return { dimension: FREE, run: () => value };
    }
    if (typeof value === 'boolean') {
      return { dimension: BOOLEAN, run: () => value };
    }
    if (typeof value === 'string') {
      return this.refuse('Formulas cannot contain text in quotes.');
    }
    return this.refuse(`The value ${String(value)} is not allowed in a formula.`);
  }

  symbol(name: string): Checked {
    const dimension = this.table.get(name);
    if (dimension !== undefined) {
      this.names.add(name);
      return {
        dimension,
        run: (scope) => {
          const value = Object.hasOwn(scope, name) ? scope[name] : undefined;
          if (value === undefined) {
            throw new MissingValueError(name);
          }
          return value;
        },
      };
    }
    if (lookupFormulaFunction(name)) {
      return this.refuse(`${name} is a function; call it with brackets, like ${name}(a, b).`);
    }
    if (literalUnit(name)) {
      return this.refuse(`Write the unit ${name} straight after a number, like 90 ${name}.`);
    }
    const similar = [...this.table.keys()].find(
      (known) => known.toLowerCase() === name.toLowerCase(),
    );
    this.problems.push({
      code: 'unknown-name',
      message: similar
        ? `"${name}" is not a reading or computed value of this tree; did you mean "${similar}"?`
        : `"${name}" is not a reading or computed value of this tree.`,
    });
    return failed;
  }

  operator(node: OperatorShape): Checked {
    if (node.isPercentage === true) {
      return this.refuse(
        'Write percentages as plain numbers: readings in % are stored as percent, so 40 means 40 %.',
      );
    }
    if (node.implicit) {
      return this.unitLiteral(node);
    }
    const { fn } = node;
    if (fn === 'unaryMinus' || fn === 'unaryPlus') {
      return this.unary(fn, node.args);
    }
    if (fn === 'not') {
      return this.logicalNot(node.args);
    }
    if (arithmeticOperators.has(fn)) {
      return this.arithmetic(fn, node.args);
    }
    if (comparisonOperators.has(fn)) {
      return this.compare(fn, node.args);
    }
    if (logicalOperators.has(fn)) {
      return this.logical(fn, node.args);
    }
    return this.refuse(
      `The operator ${operatorWords[fn] ?? `"${node.op}"`} is not allowed in a formula.`,
    );
  }

  // mathjs reads "90 degC" and "-40 degF" as an implicit multiplication of a number by a symbol.
  unitLiteral(node: OperatorShape): Checked {
    const [left, right, ...rest] = node.args;
    const name = right?.type === 'SymbolNode' ? (right as unknown as SymbolShape).name : undefined;
    const unit = name === undefined ? undefined : literalUnit(name);
    const amount = left === undefined ? undefined : signedConstant(left);
    if (rest.length > 0 || unit === undefined || amount === undefined) {
      return this.refuse(
        'Write "*" between values you multiply; a name may only follow a number when it is a unit, like 90 degC or 15 psi.',
      );
    }
    const value = toCanonical(amount, unit.unit, unit.quantity);
    this.constants.push(value);
    return { dimension: dimensionOfQuantity(unit.quantity), run: () => value };
  }

  unary(fn: 'unaryMinus' | 'unaryPlus', args: readonly MathNode[]): Checked {
    const [arg] = args;
    if (arg === undefined) {
      return this.refuse('A sign needs a value after it.');
    }
    const inner = this.visit(arg);
    if (inner.dimension.kind === 'boolean') {
      return this.mismatch('A yes/no result cannot have a sign.');
    }
    if (fn === 'unaryPlus') {
      return inner;
    }
    if (inner.dimension.kind === 'temperature') {
      return this.mismatch(
        'Negating a temperature has no meaning in °C or °F; write a negative temperature as a number, like -40 degF.',
      );
    }
    return { dimension: inner.dimension, run: (scope) => -asNumber(inner.run(scope)) };
  }

  arithmetic(fn: string, args: readonly MathNode[]): Checked {
    const checked = args.map((arg) => this.visit(arg));
    const [first, ...others] = checked;
    if (first === undefined) {
      return this.refuse('An operator needs values on both sides.');
    }
    if (fn === 'pow') {
      return this.power(first, args[1], checked[1]);
    }
    return others.reduce((left, right) => this.binaryArithmetic(fn, left, right), first);
  }

  binaryArithmetic(fn: string, left: Checked, right: Checked): Checked {
    const dimension = this.arithmeticDimension(fn, left.dimension, right.dimension);
    const l = left.run;
    const r = right.run;
    switch (fn) {
      case 'add':
        return { dimension, run: (s) => asNumber(l(s)) + asNumber(r(s)) };
      case 'subtract':
        return { dimension, run: (s) => asNumber(l(s)) - asNumber(r(s)) };
      case 'multiply':
        return { dimension, run: (s) => asNumber(l(s)) * asNumber(r(s)) };
      default:
        return { dimension, run: (s) => asNumber(l(s)) / asNumber(r(s)) };
    }
  }

  arithmeticDimension(fn: string, a: Dimension, b: Dimension): Dimension {
    if (a.kind === 'error' || b.kind === 'error') {
      return ERROR;
    }
    if (a.kind === 'boolean' || b.kind === 'boolean') {
      this.mismatch('Yes/no results cannot be used in arithmetic.');
      return ERROR;
    }
    if (fn === 'add' || fn === 'subtract') {
      return this.sumDimension(fn, a, b);
    }
    return this.productDimension(fn, a, b);
  }

  sumDimension(fn: string, a: Dimension, b: Dimension): Dimension {
    const verb = fn === 'add' ? 'adds' : 'subtracts';
    const difference = quantityDimension({ K: 1 });
    if (a.kind === 'free') {
      return fn === 'subtract' && b.kind === 'temperature' ? difference : b;
    }
    if (b.kind === 'free') {
      return a;
    }
    if (a.kind === 'temperature' && b.kind === 'temperature') {
      if (fn === 'subtract') {
        return difference;
      }
      this.mismatch(
        'The formula adds two temperatures, which has no meaning in °C; use mean(a, b) for an average or a - b for a difference.',
      );
      return ERROR;
    }
    if (a.kind === 'temperature' && sameDimension(b, difference)) {
      return TEMPERATURE;
    }
    if (b.kind === 'temperature' && sameDimension(a, difference)) {
      if (fn === 'add') {
        return TEMPERATURE;
      }
      this.mismatch('The formula subtracts a temperature from a temperature difference.');
      return ERROR;
    }
    if (sameDimension(a, b)) {
      return a;
    }
    this.mismatch(
      `The formula ${verb} ${describeDimension(b)} ${fn === 'add' ? 'to' : 'from'} ${describeDimension(a)}.`,
    );
    return ERROR;
  }

  productDimension(fn: string, a: Dimension, b: Dimension): Dimension {
    const verb = fn === 'multiply' ? 'multiplies' : 'divides';
    if (a.kind === 'temperature' || b.kind === 'temperature') {
      this.mismatch(
        `The formula ${verb} with a temperature, which has no meaning in °C; work with temperature differences (a - b) or mean(a, b) instead.`,
      );
      return ERROR;
    }
    if (isPlainNumber(b)) {
      return a.kind === 'free' ? b : a;
    }
    if (fn === 'multiply' && isPlainNumber(a)) {
      return b.kind === 'free' ? a : b;
    }
    if (a.kind === 'free' && b.kind === 'quantity') {
      return scaleExponents(b.exponents, -1);
    }
    if (a.kind === 'quantity' && b.kind === 'quantity') {
      return combineExponents(a.exponents, b.exponents, fn === 'multiply' ? 1 : -1);
    }
    return a.kind === 'quantity' ? a : PLAIN_NUMBER;
  }

  power(base: Checked, exponentNode: MathNode | undefined, exponent: Checked | undefined): Checked {
    const power = exponentNode === undefined ? undefined : signedConstant(exponentNode);
    if (exponent === undefined || power === undefined) {
      return this.refuse('Powers need a plain number as the exponent, like x^2.');
    }
    let dimension: Dimension = base.dimension;
    if (base.dimension.kind === 'temperature' || base.dimension.kind === 'boolean') {
      this.mismatch(`The formula raises ${describeDimension(base.dimension)} to a power.`);
      dimension = ERROR;
    } else if (base.dimension.kind === 'quantity' && !isPlainNumber(base.dimension)) {
      dimension = scaleExponents(base.dimension.exponents, power);
    }
    const b = base.run;
    return { dimension, run: (s) => asNumber(b(s)) ** power };
  }

  comparable(a: Dimension, b: Dimension): boolean {
    if (a.kind === 'error' || b.kind === 'error') {
      return true;
    }
    if (a.kind === 'free' || b.kind === 'free') {
      return a.kind !== 'boolean' && b.kind !== 'boolean';
    }
    if (!sameDimension(a, b)) {
      this.mismatch(`The formula compares ${describeDimension(a)} with ${describeDimension(b)}.`);
      return false;
    }
    return true;
  }

  compare(fn: string, args: readonly MathNode[]): Checked {
    const [left, right] = args.map((arg) => this.visit(arg));
    if (left === undefined || right === undefined) {
      return this.refuse('A comparison needs a value on each side.');
    }
    const orderedBooleans =
      (left.dimension.kind === 'boolean' || right.dimension.kind === 'boolean') &&
      fn !== 'equal' &&
      fn !== 'unequal';
    if (orderedBooleans) {
      return this.mismatch('Yes/no results can only be compared with == or !=.');
    }
    if (!this.comparable(left.dimension, right.dimension)) {
      return failed;
    }
    const l = left.run;
    const r = right.run;
    return { dimension: BOOLEAN, run: (s) => compareValues(fn, l(s), r(s)) };
  }

  // "82 <= x <= 91": every neighbouring pair must hold.
  relational(node: RelationalShape): Checked {
    const params = node.params.map((param) => this.visit(param));
    for (let index = 0; index + 1 < params.length; index += 1) {
      const left = params[index];
      const right = params[index + 1];
      if (left && right && !this.comparable(left.dimension, right.dimension)) {
        return failed;
      }
    }
    if (params.some((p) => p.dimension.kind === 'boolean')) {
      return this.mismatch('A chain of comparisons works on numbers, not on yes/no results.');
    }
    const operators = [...node.conditionals];
    const runs = params.map((p) => p.run);
    return {
      dimension: BOOLEAN,
      run: (s) => {
        let previous = runs[0]?.(s) ?? Number.NaN;
        for (const [index, op] of operators.entries()) {
          const next = runs[index + 1]?.(s) ?? Number.NaN;
          if (!compareValues(op, previous, next)) {
            return false;
          }
          previous = next;
        }
        return true;
      },
    };
  }

  requireBoolean(checked: Checked, role: string): boolean {
    const { kind } = checked.dimension;
    if (kind === 'boolean' || kind === 'error') {
      return true;
    }
    this.mismatch(
      `${role} must be a yes/no result (a comparison), not ${describeDimension(checked.dimension)}.`,
    );
    return false;
  }

  logicalNot(args: readonly MathNode[]): Checked {
    const [arg] = args;
    if (arg === undefined) {
      return this.refuse('"not" needs a condition after it.');
    }
    const inner = this.visit(arg);
    if (!this.requireBoolean(inner, 'The condition after "not"')) {
      return failed;
    }
    const run = inner.run;
    return { dimension: BOOLEAN, run: (s) => !run(s) };
  }

  logical(fn: string, args: readonly MathNode[]): Checked {
    const [left, right] = args.map((arg) => this.visit(arg));
    if (left === undefined || right === undefined) {
      return this.refuse(`"${fn}" needs a condition on each side.`);
    }
    const ok =
      this.requireBoolean(left, `Each side of "${fn}"`) &&
      this.requireBoolean(right, `Each side of "${fn}"`);
    if (!ok) {
      return failed;
    }
    const l = left.run;
    const r = right.run;
    // "and" and "or" stop early, so a later part that has no figure (e.g. a freezing point above
    // the table) does not spoil a result the first part already settles.
    switch (fn) {
      case 'and':
        return { dimension: BOOLEAN, run: (s) => Boolean(l(s)) && Boolean(r(s)) };
      case 'or':
        return { dimension: BOOLEAN, run: (s) => Boolean(l(s)) || Boolean(r(s)) };
      default:
        return { dimension: BOOLEAN, run: (s) => Boolean(l(s)) !== Boolean(r(s)) };
    }
  }

  conditional(node: ConditionalShape): Checked {
    const condition = this.visit(node.condition);
    const whenTrue = this.visit(node.trueExpr);
    const whenFalse = this.visit(node.falseExpr);
    this.requireBoolean(condition, 'The part before "?"');
    let dimension = whenTrue.dimension.kind === 'free' ? whenFalse.dimension : whenTrue.dimension;
    if (
      !fitsDimension(whenTrue.dimension, whenFalse.dimension) &&
      !fitsDimension(whenFalse.dimension, whenTrue.dimension)
    ) {
      this.mismatch(
        `The two results of "? :" differ: ${describeDimension(whenTrue.dimension)} and ${describeDimension(whenFalse.dimension)}.`,
      );
      dimension = ERROR;
    }
    const c = condition.run;
    const t = whenTrue.run;
    const f = whenFalse.run;
    return { dimension, run: (s) => (c(s) ? t(s) : f(s)) };
  }

  call(node: FunctionShape): Checked {
    if (node.fn.type !== 'SymbolNode') {
      return this.refuse('Only the listed functions can be called, by name, like max(a, b).');
    }
    const name = (node.fn as unknown as SymbolShape).name;
    const fn = lookupFormulaFunction(name);
    if (fn === undefined) {
      return this.refuse(
        forbiddenFunctionNames.has(name)
          ? `${name}() is not available in Heatpath formulas; formulas can only call ${callable}.`
          : `There is no function called ${name}(); formulas can call ${callable}.`,
      );
    }
    const args = node.args.map((arg) => this.visit(arg));
    if (args.length < fn.minArgs || args.length > fn.maxArgs) {
      const count = fn.minArgs === fn.maxArgs ? `${fn.minArgs}` : `${fn.minArgs} to ${fn.maxArgs}`;
      return this.refuse(
        `${name}() takes ${count} value${fn.maxArgs === 1 ? '' : 's'}, not ${args.length}.`,
      );
    }
    const dimension = fn.dimension(args.map((a) => a.dimension));
    if (typeof dimension === 'string') {
      return this.mismatch(dimension);
    }
    const runs = args.map((a) => a.run);
    return {
      dimension,
      run: (s) => fn.call(runs.map((run) => asNumber(run(s)))),
    };
  }
}

// A number written directly, possibly with a sign: "40", "-40".
function signedConstant(node: MathNode): number | undefined {
  if (node.type === 'ConstantNode') {
    const { value } = node as unknown as ConstantShape;
    return typeof value === 'number' && Number.isFinite(value) ? value : undefined;
  }
  if (node.type === 'OperatorNode') {
    const op = node as unknown as OperatorShape;
    const [inner] = op.args;
    if ((op.fn === 'unaryMinus' || op.fn === 'unaryPlus') && op.args.length === 1 && inner) {
      const value = signedConstant(inner);
      return value === undefined ? undefined : op.fn === 'unaryMinus' ? -value : value;
    }
  }
  return undefined;
}

/** Parses and checks `source` against the names a formula may use. Never throws. */
export function analyseFormula(source: string, table: FormulaNameTable): FormulaAnalysis {
  const parsed = parseFormulaSource(source);
  if (!parsed.ok) {
    return {
      ok: false,
      problems: [
        { code: 'formula-syntax', message: `The formula could not be read: ${parsed.message}.` },
      ],
    };
  }
  const checker = new FormulaChecker(table);
  const checked = checker.visit(parsed.node);
  if (checker.problems.length > 0) {
    return { ok: false, problems: checker.problems };
  }
  return {
    ok: true,
    formula: {
      source,
      dimension: checked.dimension,
      names: [...checker.names],
      constants: checker.constants,
      evaluate: checked.run,
    },
  };
}

export type { FormulaValue };
