// Freezing point of a glycol–water coolant from the handbook table, for the protection check a
// technician makes from a refractometer's concentration reading or a known mix.
import { convertPercent } from './concentration-basis.js';
import { readBasis, readGlycol } from './glycol-options.js';
import { GLYCOL_CURVES, GLYCOL_NAMES } from './glycol-tables.js';
import type { Basis, Glycol } from './glycol-tables.js';
import { advisedRange, concentrationWarnings } from './recommended-concentration.js';
import { ASHRAE_GLYCOL_TABLE } from './sources.js';
import type { SourceNote } from './sources.js';
import { toCanonical } from './units.js';
import type { QuantityInput } from './units.js';
import { warning } from './warnings.js';
import type { CoolantWarning } from './warnings.js';

export interface FreezePointOptions {
  readonly glycol: Glycol;
  /** Concentration, 0–100 (a number, "50" or "50 %"). */
  readonly percent: QuantityInput;
  readonly basis: Basis;
}

export interface FreezePointResult {
  /** Freezing point in °C, or null where the table gives no trustworthy figure. */
  readonly celsius: number | null;
  readonly massPercent: number | null;
  readonly volumePercent: number | null;
  readonly warnings: readonly CoolantWarning[];
  readonly source: SourceNote;
}

export function overConcentratedWarning(glycol: Glycol): CoolantWarning {
  const max = GLYCOL_CURVES[glycol].maxPercent;
  return warning(
    'over-concentrated',
    `Over-concentrated, protection falls again at richer mixes; use ${advisedRange(glycol)} for ${GLYCOL_NAMES[glycol]}. The handbook table ends at ${max.mass} mass % (${max.volume} vol %) and published figures beyond it disagree, so no freezing point is given.`,
  );
}

/** Freezing point of `percent` glycol in water on the given basis. */
export function freezePoint(options: FreezePointOptions): FreezePointResult {
  const glycol = readGlycol(options.glycol);
  const basis = readBasis(options.basis);
  const percent = toCanonical(options.percent, 'percentage', 'percent');
  return freezePointOf(glycol, percent, basis);
}

export function freezePointOf(glycol: Glycol, percent: number, basis: Basis): FreezePointResult {
  const curves = GLYCOL_CURVES[glycol];
  const massPercent = convertPercent(glycol, percent, basis, 'mass');
  const volumePercent = convertPercent(glycol, percent, basis, 'volume');
  if (massPercent === null || volumePercent === null) {
    return {
      celsius: null,
      massPercent,
      volumePercent,
      warnings: [overConcentratedWarning(glycol)],
      source: ASHRAE_GLYCOL_TABLE,
    };
  }
  return {
    celsius: curves.freezeByMass(massPercent),
    massPercent,
    volumePercent,
    warnings: concentrationWarnings(glycol, volumePercent),
    source: ASHRAE_GLYCOL_TABLE,
  };
}
