// The general-purpose functions formulas may call. Kept to what trade checks need: the smaller or
// larger of readings, an average, a magnitude and rounding.
import { isPlainNumber } from './dimension.js';
import type { FormulaFunction } from './formula-function.js';
import { sameAsArguments } from './formula-function.js';

function roundTo(value: number, decimals: number): number {
  if (!Number.isInteger(decimals) || decimals < 0 || decimals > 10) {
    throw new RangeError('round() takes a whole number of decimals from 0 to 10.');
  }
  const factor = 10 ** decimals;
  return Math.round(value * factor) / factor;
}

export const builtinFunctions: readonly FormulaFunction[] = [
  {
    name: 'min',
    summary: 'min(a, b, …): the smallest of its arguments, all of one kind of quantity.',
    minArgs: 1,
    maxArgs: 20,
    dimension: sameAsArguments('min'),
    call: (args) => Math.min(...args),
  },
  {
    name: 'max',
    summary: 'max(a, b, …): the largest of its arguments, all of one kind of quantity.',
    minArgs: 1,
    maxArgs: 20,
    dimension: sameAsArguments('max'),
    call: (args) => Math.max(...args),
  },
  {
    name: 'mean',
    summary:
      'mean(a, b, …): the average of its arguments, e.g. of two hose temperatures (a + b would add two temperatures, which has no meaning in °C).',
    minArgs: 1,
    maxArgs: 20,
    dimension: sameAsArguments('mean'),
    call: (args) => args.reduce((sum, value) => sum + value, 0) / args.length,
  },
  {
    name: 'abs',
    summary: 'abs(x): x without its sign, e.g. abs(liveDataTemp - probeTemp).',
    minArgs: 1,
    maxArgs: 1,
    dimension: sameAsArguments('abs'),
    call: ([value = Number.NaN]) => Math.abs(value),
  },
  {
    name: 'round',
    summary: 'round(x) or round(x, decimals): x rounded to a whole number or to 0–10 decimals.',
    minArgs: 1,
    maxArgs: 2,
    dimension: (args) => {
      const [value, decimals] = args;
      if (decimals !== undefined && !isPlainNumber(decimals)) {
        return 'round() takes a plain number of decimals as its second argument.';
      }
      return value === undefined ? 'round() needs a value.' : sameAsArguments('round')([value]);
    },
    call: ([value = Number.NaN, decimals = 0]) => roundTo(value, decimals),
  },
];
