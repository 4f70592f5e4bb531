// The whitelist of functions a formula may call: the general ones and the coolant computations
// from @heatpath/coolant, each with its unit rule. Nothing outside this table can be called.
import { formulaFunctions as coolant } from '@heatpath/coolant';
import { builtinFunctions } from './builtin-functions.js';
import { quantityDimension, TEMPERATURE } from './dimension.js';
import type { FormulaFunction } from './formula-function.js';
import { fixedSignature } from './formula-function.js';

const PERCENT = quantityDimension({ '%': 1 });
const PRESSURE = quantityDimension({ bar: 1 });
const DIFFERENCE = quantityDimension({ K: 1 });

const coolantFunctions: readonly FormulaFunction[] = [
  {
    name: 'egFreezePoint',
    summary:
      'egFreezePoint(volPercent): freezing point in °C of ethylene glycol in water at that volume percentage (no figure above 57.8 vol %).',
    minArgs: 1,
    maxArgs: 1,
    dimension: fixedSignature(
      'egFreezePoint',
      [{ label: 'concentration', dimension: PERCENT }],
      TEMPERATURE,
    ),
    call: ([volPercent = Number.NaN]) => coolant.egFreezePoint(volPercent),
  },
  {
    name: 'pgFreezePoint',
    summary:
      'pgFreezePoint(volPercent): freezing point in °C of propylene glycol in water at that volume percentage (no figure above 60 vol %).',
    minArgs: 1,
    maxArgs: 1,
    dimension: fixedSignature(
      'pgFreezePoint',
      [{ label: 'concentration', dimension: PERCENT }],
      TEMPERATURE,
    ),
    call: ([volPercent = Number.NaN]) => coolant.pgFreezePoint(volPercent),
  },
  {
    name: 'waterBoilingPoint',
    summary:
      "waterBoilingPoint(gaugeBar): boiling point in °C of plain water under that gauge pressure, e.g. a cap's rating (no figure above 3 bar gauge, beyond any vehicle cap).",
    minArgs: 1,
    maxArgs: 1,
    dimension: fixedSignature(
      'waterBoilingPoint',
      [{ label: 'gauge pressure', dimension: PRESSURE }],
      TEMPERATURE,
    ),
    call: ([gaugeBar = Number.NaN]) => coolant.waterBoilingPoint(gaugeBar),
  },
  {
    name: 'temperatureDrop',
    summary:
      'temperatureDrop(inlet, outlet): how much cooler the coolant leaves a part than it enters, in K.',
    minArgs: 2,
    maxArgs: 2,
    dimension: fixedSignature(
      'temperatureDrop',
      [
        { label: 'inlet temperature', dimension: TEMPERATURE },
        { label: 'outlet temperature', dimension: TEMPERATURE },
      ],
      DIFFERENCE,
    ),
    call: ([inlet = Number.NaN, outlet = Number.NaN]) => coolant.temperatureDrop(inlet, outlet),
  },
];

export const formulaFunctionList: readonly FormulaFunction[] = [
  ...builtinFunctions,
  ...coolantFunctions,
];

const byName = new Map(formulaFunctionList.map((fn) => [fn.name, fn]));

export function lookupFormulaFunction(name: string): FormulaFunction | undefined {
  return byName.get(name);
}
