// Scalar forms of the coolant computations for use inside tree formulas (a restricted mathjs
// scope built by the fault-tree package). Each takes and returns plain JavaScript numbers in
// canonical units and throws CoolantInputError rather than returning a figure the data do not
// support, so a formula never compares against a silent NaN.
import { boilingPointOf } from './boiling-point.js';
import { CoolantInputError } from './errors.js';
import { freezePointOf } from './freeze-point.js';
import type { Glycol } from './glycol-tables.js';
import { toCanonical } from './units.js';

function numberArgument(value: unknown, field: string): number {
  if (typeof value !== 'number') {
    throw new CoolantInputError(field, `${field} must be a plain number.`);
  }
  return value;
}

function freezeByVolume(glycol: Glycol, volPercent: unknown, field: string): number {
  const percent = toCanonical(numberArgument(volPercent, field), 'percentage', field);
  const result = freezePointOf(glycol, percent, 'volume');
  if (result.celsius === null) {
    throw new CoolantInputError(field, result.warnings[0]?.message ?? 'No freezing point here.');
  }
  return result.celsius;
}

export interface CoolantFormulaFunctions {
  /** Freezing point in °C of ethylene glycol at `volPercent` vol %; throws above 57.8 vol %. */
  readonly egFreezePoint: (volPercent: number) => number;
  /** Freezing point in °C of propylene glycol at `volPercent` vol %; throws above 60 vol %. */
  readonly pgFreezePoint: (volPercent: number) => number;
  /** Water's boiling point in °C at `gaugeBar` bar gauge (IAPWS-IF97); throws above 3 bar gauge. */
  readonly waterBoilingPoint: (gaugeBar: number) => number;
  /** `inletCelsius − outletCelsius` in K (positive when the coolant cools across the part). */
  readonly temperatureDrop: (inletCelsius: number, outletCelsius: number) => number;
}

export const formulaFunctions: CoolantFormulaFunctions = {
  egFreezePoint: (volPercent) => freezeByVolume('ethylene', volPercent, 'volPercent'),
  pgFreezePoint: (volPercent) => freezeByVolume('propylene', volPercent, 'volPercent'),
  waterBoilingPoint: (gaugeBar) =>
    boilingPointOf(toCanonical(numberArgument(gaugeBar, 'gaugeBar'), 'pressure', 'gaugeBar'))
      .celsius,
  temperatureDrop: (inletCelsius, outletCelsius) => {
    const inlet = toCanonical(
      numberArgument(inletCelsius, 'inletCelsius'),
      'temperature',
      'inletCelsius',
    );
    const outlet = toCanonical(
      numberArgument(outletCelsius, 'outletCelsius'),
      'temperature',
      'outletCelsius',
    );
    return inlet - outlet;
  },
};
