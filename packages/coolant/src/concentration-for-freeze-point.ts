// The inverse of the freezing-point table: how strong a mix must be to protect down to a target
// temperature, for topping up or mixing coolant for a climate.
import { convertPercent } from './concentration-basis.js';
import { CoolantInputError } from './errors.js';
import { readBasis, readGlycol } from './glycol-options.js';
import { GLYCOL_CURVES, GLYCOL_NAMES } from './glycol-tables.js';
import type { Basis, Glycol } from './glycol-tables.js';
import { formatFigure } from './display-rounding.js';
import { invertMonotone } from './monotone-interpolation.js';
import { advisedRange, concentrationWarnings } from './recommended-concentration.js';
import { ASHRAE_GLYCOL_TABLE } from './sources.js';
import type { SourceNote } from './sources.js';
import { toCanonical } from './units.js';
import type { QuantityInput } from './units.js';
import { warning } from './warnings.js';
import type { CoolantWarning } from './warnings.js';

export interface ConcentrationForFreezePointOptions {
  readonly glycol: Glycol;
  /** Target freezing point: °C as a number, or a typed temperature such as "-30 degF". */
  readonly celsius: QuantityInput;
  readonly basis: Basis;
}

export interface ConcentrationForFreezePointResult {
  /** Concentration on the requested basis. */
  readonly percent: number;
  readonly massPercent: number;
  readonly volumePercent: number;
  readonly warnings: readonly CoolantWarning[];
  readonly source: SourceNote;
}

/** Weakest mix whose freezing point is at or below `celsius`; refuses targets no mix reaches. */
export function concentrationForFreezePoint(
  options: ConcentrationForFreezePointOptions,
): ConcentrationForFreezePointResult {
  const glycol = readGlycol(options.glycol);
  const basis = readBasis(options.basis);
  const target = toCanonical(options.celsius, 'temperature', 'celsius');
  const curves = GLYCOL_CURVES[glycol];

  if (target < curves.coldestCelsius) {
    const max = curves.maxPercent;
    throw new CoolantInputError(
      'celsius',
      `No ${GLYCOL_NAMES[glycol]} mix protects to ${formatFigure(target, 'temperature')}. The handbook table's coldest point is ${curves.coldestCelsius} °C at ${max.mass} mass % (${max.volume} vol %), and richer mixes protect less, not more.`,
    );
  }
  if (target >= 0) {
    return {
      percent: 0,
      massPercent: 0,
      volumePercent: 0,
      warnings: [
        warning(
          'no-glycol-needed',
          `Water alone does not freeze above 0 °C, so no glycol is needed for ${formatFigure(target, 'temperature')}; the coolant still needs ${advisedRange(glycol)} for corrosion and boil protection (ASTM D3306: 40–60 vol %).`,
        ),
      ],
      source: ASHRAE_GLYCOL_TABLE,
    };
  }
  const massPercent = invertMonotone(curves.freezeByMass, target);
  // Within the table, so the conversions cannot come back null.
  const volumePercent = convertPercent(glycol, massPercent, 'mass', 'volume') ?? Number.NaN;
  return {
    percent: basis === 'mass' ? massPercent : volumePercent,
    massPercent,
    volumePercent,
    warnings: concentrationWarnings(glycol, volumePercent),
    source: ASHRAE_GLYCOL_TABLE,
  };
}
