// Density and specific heat of coolant for heat-flow estimates, read from the tables in
// property-tables.ts: water 0–120 °C (IAPWS-IF97), ethylene and propylene glycol 10–60 vol % at
// 0–100 °C (ASHRAE). Between rows and columns values are interpolated linearly — the tables step
// 5 K and 10 vol %, and both properties are smooth and nearly straight over such steps. Above the
// glycol tables' 100 °C the last 5 K of each column is carried on in a straight line to 120 °C,
// with a warning (see EXTRAPOLATION_NOTE).
import { formatFigure, roundForDisplay } from './display-rounding.js';
import { CoolantInputError } from './errors.js';
import type { Glycol } from './glycol-tables.js';
import {
  ETHYLENE_GLYCOL_PROPERTIES,
  PROPYLENE_GLYCOL_PROPERTIES,
  WATER_PROPERTIES,
} from './property-tables.js';
import type { PropertyGrid } from './property-tables.js';
import type { SourceNote } from './sources.js';
import { at } from './table-access.js';
import { warning } from './warnings.js';
import type { CoolantWarning } from './warnings.js';

export const PROPERTY_TEMPERATURE_RANGE = { min: 0, max: 120 } as const;
export const PROPERTY_MAX_VOLUME_PERCENT = 60;

const GRIDS: Record<Glycol, PropertyGrid> = {
  ethylene: ETHYLENE_GLYCOL_PROPERTIES,
  propylene: PROPYLENE_GLYCOL_PROPERTIES,
};

// Why a straight line above 100 °C is fair: carried the same way from the table's 75–80 °C rows
// to its 100 °C row (20 K, as far as 100 → 120 °C), the line misses the printed figure by at most
// 0.13 % (density) and 0.12 % (cp) in every column of both tables — far inside the ±1 % the
// sources differ by. coolant-properties.test.ts repeats that check.
const EXTRAPOLATION_NOTE =
  "The handbook tables for glycol stop at 100 °C; above that, density and specific heat are carried on in a straight line from the table's last 5 K (the same straight line, tried on the table over 80–100 °C, stays within 0.15 % of its printed figures).";

export interface CoolantProperties {
  /** kg/m³ */
  readonly density: number;
  /** J/(kg·K) */
  readonly cp: number;
  readonly warnings: readonly CoolantWarning[];
  readonly sources: readonly SourceNote[];
}

interface Pair {
  readonly density: number;
  readonly cp: number;
}

/** Index i with xs[i] ≤ x ≤ xs[i+1], clamped to the last interval for x past the end. */
function segment(xs: readonly number[], x: number): number {
  for (let i = 0; i < xs.length - 2; i++) {
    if (x <= at(xs, i + 1)) return i;
  }
  return xs.length - 2;
}

function lerp(x: number, x0: number, x1: number, y0: number, y1: number): number {
  return y0 + ((x - x0) / (x1 - x0)) * (y1 - y0);
}

/** Linear in x along an evenly sampled series; past the end the last segment carries on. */
function along(xs: readonly number[], ys: readonly number[], x: number): number {
  const i = segment(xs, x);
  return lerp(x, at(xs, i), at(xs, i + 1), at(ys, i), at(ys, i + 1));
}

function water(celsius: number): Pair {
  const w = WATER_PROPERTIES;
  return { density: along(w.celsius, w.density, celsius), cp: along(w.celsius, w.cp, celsius) };
}

function glycolColumn(grid: PropertyGrid, column: number, celsius: number): Pair {
  const density = grid.density.map((row) => at(row, column));
  const cp = grid.cp.map((row) => at(row, column));
  return { density: along(grid.celsius, density, celsius), cp: along(grid.celsius, cp, celsius) };
}

function glycol(grid: PropertyGrid, volumePercent: number, celsius: number): Pair {
  const columns = grid.volumePercents;
  // Below the first column (10 vol %) the line runs from plain water to that column.
  if (volumePercent < at(columns, 0)) {
    const w = water(celsius);
    const first = glycolColumn(grid, 0, celsius);
    const c0 = at(columns, 0);
    return {
      density: lerp(volumePercent, 0, c0, w.density, first.density),
      cp: lerp(volumePercent, 0, c0, w.cp, first.cp),
    };
  }
  const i = segment(columns, volumePercent);
  const a = glycolColumn(grid, i, celsius);
  const b = glycolColumn(grid, i + 1, celsius);
  const c0 = at(columns, i);
  const c1 = at(columns, i + 1);
  return {
    density: lerp(volumePercent, c0, c1, a.density, b.density),
    cp: lerp(volumePercent, c0, c1, a.cp, b.cp),
  };
}

/**
 * Properties of water (`volumePercent` 0) or `glycol` at 0–60 vol %, at `meanCelsius` 0–120 °C.
 * Refuses outside those ranges: no cited figure exists there.
 */
export function coolantProperties(
  glycolKind: Glycol,
  volumePercent: number,
  meanCelsius: number,
): CoolantProperties {
  const { min, max } = PROPERTY_TEMPERATURE_RANGE;
  if (meanCelsius < min || meanCelsius > max) {
    throw new CoolantInputError(
      'inletCelsius',
      `The mean of the two readings is ${formatFigure(meanCelsius, 'temperature')}; Heatpath's cited density and specific-heat figures cover a mean of ${min}–${max} °C, so no heat flow is worked out outside that.`,
    );
  }
  if (volumePercent > PROPERTY_MAX_VOLUME_PERCENT) {
    throw new CoolantInputError(
      'percent',
      `The handbook density and specific-heat tables stop at ${PROPERTY_MAX_VOLUME_PERCENT} vol %; ${roundForDisplay(volumePercent, 'concentration')} vol % is richer than any advised mix, so no heat flow is worked out.`,
    );
  }
  if (volumePercent === 0) {
    return { ...water(meanCelsius), warnings: [], sources: [WATER_PROPERTIES.source] };
  }
  const grid = GRIDS[glycolKind];
  const lastRow = at(grid.celsius, grid.celsius.length - 1);
  const warnings =
    meanCelsius > lastRow ? [warning('properties-extrapolated', EXTRAPOLATION_NOTE)] : [];
  const sources =
    volumePercent < at(grid.volumePercents, 0)
      ? [grid.source, WATER_PROPERTIES.source]
      : [grid.source];
  return { ...glycol(grid, volumePercent, meanCelsius), warnings, sources };
}
