// The handbook freezing-point tables for glycol in water, with their mass %/vol % columns, and
// the interpolating curves built from them. Every figure here is copied from the table named in
// ASHRAE_GLYCOL_TABLE; nothing is fitted or smoothed beyond the monotone interpolation.
import { createMonotoneInterpolator, invertMonotone } from './monotone-interpolation.js';
import type { MonotoneInterpolator } from './monotone-interpolation.js';
import { at } from './table-access.js';

export type Glycol = 'ethylene' | 'propylene';
export type Basis = 'mass' | 'volume';

export interface FreezeTableRow {
  readonly massPercent: number;
  readonly volumePercent: number;
  readonly freezeCelsius: number;
}

/** Ethylene glycol in water, ASHRAE Handbook—Fundamentals (Source A in trade-facts.md). */
export const ETHYLENE_GLYCOL_FREEZE_TABLE: readonly FreezeTableRow[] = [
  { massPercent: 0, volumePercent: 0, freezeCelsius: 0.0 },
  { massPercent: 10, volumePercent: 8.9, freezeCelsius: -3.2 },
  { massPercent: 20, volumePercent: 18.1, freezeCelsius: -7.8 },
  { massPercent: 25, volumePercent: 22.9, freezeCelsius: -10.7 },
  { massPercent: 30, volumePercent: 27.7, freezeCelsius: -14.1 },
  { massPercent: 35, volumePercent: 32.6, freezeCelsius: -17.9 },
  { massPercent: 40, volumePercent: 37.5, freezeCelsius: -22.3 },
  { massPercent: 45, volumePercent: 42.5, freezeCelsius: -27.5 },
  { massPercent: 50, volumePercent: 47.6, freezeCelsius: -33.8 },
  { massPercent: 55, volumePercent: 52.7, freezeCelsius: -41.1 },
  { massPercent: 60, volumePercent: 57.8, freezeCelsius: -48.3 },
];

/**
 * Propylene glycol in water, ASHRAE Handbook—Fundamentals (Source A). The handbook rows start at
 * 10 %; the 0 % row is pure water's ice point, the same 0.0 °C the ethylene table gives, so the
 * curve reaches plain water instead of stopping at 10 %.
 */
export const PROPYLENE_GLYCOL_FREEZE_TABLE: readonly FreezeTableRow[] = [
  { massPercent: 0, volumePercent: 0, freezeCelsius: 0.0 },
  { massPercent: 10, volumePercent: 9.6, freezeCelsius: -3.3 },
  { massPercent: 20, volumePercent: 19.4, freezeCelsius: -7.1 },
  { massPercent: 30, volumePercent: 29.4, freezeCelsius: -12.7 },
  { massPercent: 40, volumePercent: 39.6, freezeCelsius: -21.1 },
  { massPercent: 50, volumePercent: 49.9, freezeCelsius: -33.5 },
  { massPercent: 60, volumePercent: 60.0, freezeCelsius: -51.1 },
];

export const FREEZE_TABLES: Record<Glycol, readonly FreezeTableRow[]> = {
  ethylene: ETHYLENE_GLYCOL_FREEZE_TABLE,
  propylene: PROPYLENE_GLYCOL_FREEZE_TABLE,
};

export interface GlycolCurves {
  readonly freezeByMass: MonotoneInterpolator;
  readonly volumeFromMass: MonotoneInterpolator;
  /** The exact inverse of volumeFromMass, so a mix converted there and back is the same mix. */
  readonly massFromVolume: (volumePercent: number) => number;
  /** Highest concentration the table covers, on each basis. */
  readonly maxPercent: Record<Basis, number>;
  /** Coldest freezing point in the table (at its richest row). */
  readonly coldestCelsius: number;
}

function buildCurves(table: readonly FreezeTableRow[]): GlycolCurves {
  const mass = table.map((r) => r.massPercent);
  const volume = table.map((r) => r.volumePercent);
  const freeze = table.map((r) => r.freezeCelsius);
  const last = at(table, table.length - 1);
  const volumeFromMass = createMonotoneInterpolator(mass, volume);
  return {
    freezeByMass: createMonotoneInterpolator(mass, freeze),
    volumeFromMass,
    massFromVolume: (volumePercent) => invertMonotone(volumeFromMass, volumePercent),
    maxPercent: { mass: last.massPercent, volume: last.volumePercent },
    coldestCelsius: last.freezeCelsius,
  };
}

export const GLYCOL_CURVES: Record<Glycol, GlycolCurves> = {
  ethylene: buildCurves(ETHYLENE_GLYCOL_FREEZE_TABLE),
  propylene: buildCurves(PROPYLENE_GLYCOL_FREEZE_TABLE),
};

export const GLYCOL_NAMES: Record<Glycol, string> = {
  ethylene: 'ethylene glycol',
  propylene: 'propylene glycol',
};
