// A lightweight dimension type for formulas. Formulas compute on plain numbers in canonical units,
// so the only thing that can go wrong with units is mixing kinds of quantity; this module lets
// validation catch that ("compares a temperature with a pressure") before a walk ever runs.
//
// Absolute temperatures are kept apart from temperature differences because °C has an offset:
// the difference of two temperatures is a difference (K), a temperature plus a difference is a
// temperature, but the sum of two temperatures means nothing.
import type { Quantity } from '../units/quantities.js';

export const baseUnits = ['K', 'bar', 'min', 'L', '%'] as const;
export type BaseUnit = (typeof baseUnits)[number];
export type Exponents = Readonly<Record<BaseUnit, number>>;

export type Dimension =
  /** A bare number written in the formula: it takes the unit of whatever it meets. */
  | { readonly kind: 'free' }
  | { readonly kind: 'boolean' }
  | { readonly kind: 'temperature' }
  | { readonly kind: 'quantity'; readonly exponents: Exponents }
  /** Already reported as a problem; suppresses follow-on complaints. */
  | { readonly kind: 'error' };

const zero: Exponents = { K: 0, bar: 0, min: 0, L: 0, '%': 0 };

export const FREE: Dimension = { kind: 'free' };
export const BOOLEAN: Dimension = { kind: 'boolean' };
export const TEMPERATURE: Dimension = { kind: 'temperature' };
export const ERROR: Dimension = { kind: 'error' };

export function quantityDimension(exponents: Partial<Record<BaseUnit, number>>): Dimension {
  return { kind: 'quantity', exponents: { ...zero, ...exponents } };
}

export const PLAIN_NUMBER = quantityDimension({});

export function dimensionOfQuantity(quantity: Quantity): Dimension {
  switch (quantity) {
    case 'temperature':
      return TEMPERATURE;
    case 'temperatureDelta':
      return quantityDimension({ K: 1 });
    case 'pressure':
      return quantityDimension({ bar: 1 });
    case 'time':
      return quantityDimension({ min: 1 });
    case 'volume':
      return quantityDimension({ L: 1 });
    case 'volumeFlow':
      return quantityDimension({ L: 1, min: -1 });
    case 'percentage':
      return quantityDimension({ '%': 1 });
    case 'number':
      return PLAIN_NUMBER;
  }
}

export function sameDimension(a: Dimension, b: Dimension): boolean {
  if (a.kind !== b.kind) {
    return false;
  }
  if (a.kind === 'quantity' && b.kind === 'quantity') {
    return baseUnits.every((unit) => a.exponents[unit] === b.exponents[unit]);
  }
  return true;
}

/** Whether a value of dimension `actual` may stand where `expected` is wanted (a bare number fits anywhere numeric). */
export function fitsDimension(actual: Dimension, expected: Dimension): boolean {
  if (actual.kind === 'error' || expected.kind === 'error') {
    return true;
  }
  if (actual.kind === 'free') {
    return expected.kind !== 'boolean';
  }
  return sameDimension(actual, expected);
}

export function isPlainNumber(d: Dimension): boolean {
  return d.kind === 'free' || (d.kind === 'quantity' && sameDimension(d, PLAIN_NUMBER));
}

export function combineExponents(a: Exponents, b: Exponents, sign: 1 | -1): Dimension {
  const result: Record<BaseUnit, number> = { ...zero };
  for (const unit of baseUnits) {
    result[unit] = a[unit] + sign * b[unit];
  }
  return { kind: 'quantity', exponents: result };
}

export function scaleExponents(a: Exponents, factor: number): Dimension {
  const result: Record<BaseUnit, number> = { ...zero };
  for (const unit of baseUnits) {
    result[unit] = a[unit] * factor;
  }
  return { kind: 'quantity', exponents: result };
}

const namedQuantities: ReadonlyArray<[Dimension, string]> = [
  [quantityDimension({ K: 1 }), 'a temperature difference'],
  [quantityDimension({ bar: 1 }), 'a pressure'],
  [quantityDimension({ min: 1 }), 'a time'],
  [quantityDimension({ L: 1 }), 'a volume'],
  [quantityDimension({ '%': 1 }), 'a percentage'],
  [PLAIN_NUMBER, 'a plain number'],
];

function unitExpression(exponents: Exponents): string {
  const up: string[] = [];
  const down: string[] = [];
  for (const unit of baseUnits) {
    const power = exponents[unit];
    const shown = Math.abs(power) === 1 ? unit : `${unit}^${Math.abs(power)}`;
    if (power > 0) up.push(shown);
    if (power < 0) down.push(shown);
  }
  const top = up.length > 0 ? up.join('·') : '1';
  return down.length > 0 ? `${top}/${down.join('·')}` : top;
}

/** "a temperature", "a pressure", "a value in bar/min" — for problem messages. */
export function describeDimension(d: Dimension): string {
  switch (d.kind) {
    case 'free':
      return 'a plain number';
    case 'boolean':
      return 'a yes/no result';
    case 'temperature':
      return 'a temperature';
    case 'error':
      return 'an unreadable value';
    case 'quantity': {
      const named = namedQuantities.find(([dimension]) => sameDimension(dimension, d));
      return named ? named[1] : `a value in ${unitExpression(d.exponents)}`;
    }
  }
}
