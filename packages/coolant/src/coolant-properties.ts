// Density and specific heat of coolant for heat-flow estimates, limited to the points the cited
// tables give: ethylene glycol at 40, 50 and 60 vol % (50 % across 80–90 °C, the others at 85 °C
// only) and water at 85 °C. Outside that, Heatpath refuses rather than guessing.
import { CoolantInputError } from './errors.js';
import { ASHRAE_GLYCOL_TABLE, IAPWS_IF97_WATER_85C } from './sources.js';
import type { SourceNote } from './sources.js';
import { at } from './table-access.js';
import { warning } from './warnings.js';
import type { CoolantWarning } from './warnings.js';

interface PropertyPoint {
  readonly celsius: number;
  readonly density: number;
  readonly cp: number;
}

/** 50 vol % ethylene glycol, ASHRAE Handbook—Fundamentals (Source A). */
export const EG50_BY_TEMPERATURE: readonly PropertyPoint[] = [
  { celsius: 80, density: 1038.5, cp: 3512 },
  { celsius: 85, density: 1034.8, cp: 3532 },
  { celsius: 90, density: 1031.0, cp: 3551 },
];

interface ConcentrationPoint {
  readonly volumePercent: number;
  readonly density: number;
  readonly cp: number;
}

/** Ethylene glycol at 85 °C by vol %, ASHRAE Handbook—Fundamentals (Source A). */
export const EG_AT_85C: readonly ConcentrationPoint[] = [
  { volumePercent: 40, density: 1023.1, cp: 3686 },
  { volumePercent: 50, density: 1034.8, cp: 3532 },
  { volumePercent: 60, density: 1045.6, cp: 3367 },
];

/** Water at 85 °C, 0.2 MPa (IAPWS-IF97). */
export const WATER_AT_85C = { density: 968.67, cp: 4199.8 } as const;

export const PROPERTY_TEMPERATURE_RANGE = { min: 80, max: 90 } as const;
const TABLE_TEMPERATURE = 85;

export interface CoolantProperties {
  /** kg/m³ */
  readonly density: number;
  /** J/(kg·K) */
  readonly cp: number;
  readonly warnings: readonly CoolantWarning[];
  readonly sources: readonly SourceNote[];
}

function linear<T>(
  points: readonly T[],
  x: number,
  key: (p: T) => number,
  value: (p: T) => number,
): number {
  for (let i = 0; i < points.length - 1; i++) {
    const a = at(points, i);
    const b = at(points, i + 1);
    if (x >= key(a) && x <= key(b)) {
      const t = (x - key(a)) / (key(b) - key(a));
      return value(a) + t * (value(b) - value(a));
    }
  }
  throw new RangeError(`${x} lies outside the property table.`);
}

/**
 * Properties of ethylene glycol at `volumePercent` (0 for water, or 40–60) and `meanCelsius`
 * (80–90 °C). Between the table's rows values are interpolated linearly; where the table has no
 * temperature series the 50 % series' change with temperature is borrowed, with a warning.
 */
export function coolantProperties(volumePercent: number, meanCelsius: number): CoolantProperties {
  if (
    meanCelsius < PROPERTY_TEMPERATURE_RANGE.min ||
    meanCelsius > PROPERTY_TEMPERATURE_RANGE.max
  ) {
    throw new CoolantInputError(
      'inletCelsius',
      `The mean coolant temperature is ${meanCelsius.toFixed(1)} °C; the cited density and specific-heat figures cover only 80–90 °C, so no heat flow is computed outside that.`,
    );
  }
  const offTableTemperature = meanCelsius !== TABLE_TEMPERATURE;
  if (volumePercent === 0) {
    return {
      density: WATER_AT_85C.density,
      cp: WATER_AT_85C.cp,
      warnings: offTableTemperature
        ? [
            warning(
              'properties-approximated',
              `Water's density and specific heat are taken at 85 °C (the only point cited) for the mean ${meanCelsius.toFixed(1)} °C; over 80–90 °C they change by well under 1 % (about 0.3 % for density; from memory).`,
            ),
          ]
        : [],
      sources: [IAPWS_IF97_WATER_85C],
    };
  }
  if (volumePercent < 40 || volumePercent > 60) {
    throw new CoolantInputError(
      'percent',
      `Density and specific heat are cited for ethylene glycol at 40, 50 and 60 vol % (and for plain water); ${volumePercent.toFixed(1)} vol % is outside that, so no heat flow is computed.`,
    );
  }
  const density85 = linear(
    EG_AT_85C,
    volumePercent,
    (p) => p.volumePercent,
    (p) => p.density,
  );
  const cp85 = linear(
    EG_AT_85C,
    volumePercent,
    (p) => p.volumePercent,
    (p) => p.cp,
  );
  const densityShift =
    linear(
      EG50_BY_TEMPERATURE,
      meanCelsius,
      (p) => p.celsius,
      (p) => p.density,
    ) - at(EG_AT_85C, 1).density;
  const cpShift =
    linear(
      EG50_BY_TEMPERATURE,
      meanCelsius,
      (p) => p.celsius,
      (p) => p.cp,
    ) - at(EG_AT_85C, 1).cp;
  const warnings: CoolantWarning[] = [];
  if (offTableTemperature && volumePercent !== 50) {
    warnings.push(
      warning(
        'properties-approximated',
        `The table gives ${volumePercent.toFixed(1)} vol % only at 85 °C; its change with temperature to ${meanCelsius.toFixed(1)} °C is borrowed from the 50 vol % series (a shift of under 0.6 %).`,
      ),
    );
  }
  return {
    density: density85 + densityShift,
    cp: cp85 + cpShift,
    warnings,
    sources: [ASHRAE_GLYCOL_TABLE],
  };
}
