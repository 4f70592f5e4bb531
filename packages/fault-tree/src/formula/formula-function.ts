// The shape of a function a formula may call, and helpers to state its unit rules. Every function
// works on plain numbers in canonical units; its dimension rule lets validation check the call.
import type { Dimension } from './dimension.js';
import { describeDimension, fitsDimension, FREE } from './dimension.js';

export interface FormulaFunction {
  readonly name: string;
  /** One line for the editor's help and docs/tree-format.md. */
  readonly summary: string;
  readonly minArgs: number;
  readonly maxArgs: number;
  /** The dimension of the result, or a sentence naming what is wrong with the arguments. */
  readonly dimension: (args: readonly Dimension[]) => Dimension | string;
  /** May throw when the function has no figure for its arguments; the formula then has no value. */
  readonly call: (args: readonly number[]) => number;
}

/** A rule for functions whose arguments all share one dimension, which the result keeps. */
export function sameAsArguments(name: string) {
  return (args: readonly Dimension[]): Dimension | string => {
    if (args.some((d) => d.kind === 'boolean')) {
      return `${name}() works on numbers, not on yes/no results.`;
    }
    const fixed = args.find((d) => d.kind !== 'free' && d.kind !== 'error') ?? FREE;
    const misfit = args.find((d) => !fitsDimension(d, fixed));
    if (misfit) {
      return `${name}() mixes ${describeDimension(fixed)} with ${describeDimension(misfit)}.`;
    }
    return args.some((d) => d.kind === 'error') ? { kind: 'error' } : fixed;
  };
}

/** A rule for functions with a fixed list of parameter dimensions. */
export function fixedSignature(
  name: string,
  parameters: ReadonlyArray<{ readonly label: string; readonly dimension: Dimension }>,
  result: Dimension,
) {
  return (args: readonly Dimension[]): Dimension | string => {
    for (const [index, parameter] of parameters.entries()) {
      const actual = args[index];
      if (actual !== undefined && !fitsDimension(actual, parameter.dimension)) {
        return `${name}() takes ${describeDimension(parameter.dimension)} as its ${parameter.label}, not ${describeDimension(actual)}.`;
      }
    }
    return result;
  };
}
