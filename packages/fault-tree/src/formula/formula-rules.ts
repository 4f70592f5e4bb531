// What a formula may contain beyond names and functions: the operators, the units that may follow
// a number, and the words that can never be value names. Kept apart from the checker so the
// editor and docs can list them.
import type { Quantity, UnitCode } from '../units/quantities.js';

export type ArithmeticOperator = 'add' | 'subtract' | 'multiply' | 'divide' | 'pow';
export type UnaryOperator = 'unaryMinus' | 'unaryPlus';
export type ComparisonOperator =
  'smaller' | 'larger' | 'smallerEq' | 'largerEq' | 'equal' | 'unequal';
export type LogicalOperator = 'and' | 'or' | 'xor';

export const arithmeticOperators: ReadonlySet<string> = new Set<ArithmeticOperator>([
  'add',
  'subtract',
  'multiply',
  'divide',
  'pow',
]);
export const comparisonOperators: ReadonlySet<string> = new Set<ComparisonOperator>([
  'smaller',
  'larger',
  'smallerEq',
  'largerEq',
  'equal',
  'unequal',
]);
export const logicalOperators: ReadonlySet<string> = new Set<LogicalOperator>(['and', 'or', 'xor']);

/** Units that may be written straight after a number in a formula ("90 degC", "15 psi"). */
export const literalUnitQuantities: Readonly<Partial<Record<UnitCode, Quantity>>> = {
  degC: 'temperature',
  degF: 'temperature',
  K: 'temperatureDelta',
  bar: 'pressure',
  psi: 'pressure',
  kPa: 'pressure',
  s: 'time',
  min: 'time',
  h: 'time',
  L: 'volume',
  mL: 'volume',
  qt: 'volume',
  gal: 'volume',
};

export function literalUnit(name: string): { unit: UnitCode; quantity: Quantity } | undefined {
  if (!Object.hasOwn(literalUnitQuantities, name)) {
    return undefined;
  }
  const unit = name as UnitCode;
  const quantity = literalUnitQuantities[unit];
  return quantity === undefined ? undefined : { unit, quantity };
}

// mathjs functions that would reach outside a formula if they were ever callable. They are refused
// like any unknown function; naming them gives the lead a clearer sentence.
export const forbiddenFunctionNames: ReadonlySet<string> = new Set([
  'import',
  'createUnit',
  'evaluate',
  'parse',
  'compile',
  'simplify',
  'derivative',
  'resolve',
  'parser',
  'chain',
  'config',
  'typed',
  'reviver',
  'replacer',
  'help',
  'format',
  'print',
]);

/** Words mathjs reads as operators or constants, and object built-ins; values may not be named like this. */
export const reservedWords: ReadonlySet<string> = new Set([
  'and',
  'or',
  'xor',
  'not',
  'mod',
  'to',
  'in',
  'true',
  'false',
  'null',
  'undefined',
  'end',
  'pi',
  'e',
  'i',
  'Infinity',
  'NaN',
  // Names every JavaScript object already has; refused so no lookup can ever reach them.
  'constructor',
  'prototype',
  'toString',
  'valueOf',
  'hasOwnProperty',
]);
