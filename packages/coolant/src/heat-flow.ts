// Heat carried away by the coolant across a radiator, heater core or engine, from a flow reading
// and the temperatures either side: Q = ṁ·cp·ΔT. Useful to compare a radiator's duty with what
// the engine should be rejecting.
import { convertPercent } from './concentration-basis.js';
import { coolantProperties } from './coolant-properties.js';
import { readCoolantTemperature } from './coolant-temperature.js';
import { CoolantInputError } from './errors.js';
import { formatFigure, roundForDisplay } from './display-rounding.js';
import { freezePointOf } from './freeze-point.js';
import { readBasis, readGlycol } from './glycol-options.js';
import type { Basis, Glycol } from './glycol-tables.js';
import { GLYCOL_NAMES } from './glycol-tables.js';
import type { SourceNote } from './sources.js';
import { toCanonical } from './units.js';
import type { QuantityInput } from './units.js';
import type { CoolantWarning } from './warnings.js';

export interface HeatFlowOptions {
  readonly glycol: Glycol;
  readonly percent: QuantityInput;
  readonly basis: Basis;
  /** Volume flow: L/min as a number, or typed such as "10 gal/min". */
  readonly litresPerMinute: QuantityInput;
  readonly inletCelsius: QuantityInput;
  readonly outletCelsius: QuantityInput;
}

export interface HeatFlowResult {
  /** Heat given up by the coolant between inlet and outlet, kW; negative if it gained heat. */
  readonly kilowatts: number;
  readonly meanCelsius: number;
  /** inlet − outlet, K. */
  readonly temperatureDropKelvin: number;
  readonly densityKgPerCubicMetre: number;
  readonly specificHeatJPerKgK: number;
  readonly massFlowKgPerSecond: number;
  readonly volumePercent: number;
  readonly warnings: readonly CoolantWarning[];
  readonly sources: readonly SourceNote[];
}

/**
 * Limits of what a road vehicle's cooling circuit can show (common practice). A car's main pump
 * moves roughly 50–250 L/min at high engine speed and a heavy truck's a few hundred; 1,000 L/min
 * is beyond any vehicle pump, so a larger figure is a misreading or the wrong unit.
 */
export const HEAT_FLOW_LIMITS = {
  maxLitresPerMinute: 1000,
} as const;

function readTemperature(
  value: QuantityInput,
  field: string,
  freezeCelsius: number | null,
  mixName: string,
): number {
  const celsius = readCoolantTemperature(value, field);
  if (freezeCelsius !== null && celsius < freezeCelsius) {
    throw new CoolantInputError(
      field,
      `${mixName} freezes at about ${formatFigure(freezeCelsius, 'freezePoint')}, so at ${formatFigure(celsius, 'temperature')} it would not flow; check the reading, the unit and the mix.`,
    );
  }
  return celsius;
}

/** Heat flow in kW with properties at the mean of inlet and outlet temperatures. */
export function heatFlow(options: HeatFlowOptions): HeatFlowResult {
  const glycol = readGlycol(options.glycol);
  const basis = readBasis(options.basis);
  const percent = toCanonical(options.percent, 'percentage', 'percent');
  const flow = toCanonical(options.litresPerMinute, 'volumeFlow', 'litresPerMinute');
  if (flow > HEAT_FLOW_LIMITS.maxLitresPerMinute) {
    throw new CoolantInputError(
      'litresPerMinute',
      `${flow.toPrecision(3)} L/min is more than any vehicle coolant pump moves (a car's moves roughly 50–250 L/min); check the flow meter's reading and unit.`,
    );
  }
  const volumePercent = convertPercent(glycol, percent, basis, 'volume');
  if (volumePercent === null) {
    throw new CoolantInputError(
      'percent',
      `${percent} ${basis} % ${GLYCOL_NAMES[glycol]} is richer than the handbook tables reach; no advised mix is that strong.`,
    );
  }
  const mixName =
    volumePercent === 0
      ? 'Water'
      : `${roundForDisplay(volumePercent, 'concentration')} vol % ${GLYCOL_NAMES[glycol]}`;
  const freezeCelsius = freezePointOf(glycol, volumePercent, 'volume').celsius;
  const inlet = readTemperature(options.inletCelsius, 'inletCelsius', freezeCelsius, mixName);
  const outlet = readTemperature(options.outletCelsius, 'outletCelsius', freezeCelsius, mixName);

  const meanCelsius = (inlet + outlet) / 2;
  const props = coolantProperties(glycol, volumePercent, meanCelsius);
  // L/min → m³/s, then kg/s. The flow meter reads volume at the coolant's own temperature.
  const massFlow = (props.density * flow) / 60_000;
  const drop = inlet - outlet;
  return {
    kilowatts: (massFlow * props.cp * drop) / 1000,
    meanCelsius,
    temperatureDropKelvin: drop,
    densityKgPerCubicMetre: props.density,
    specificHeatJPerKgK: props.cp,
    massFlowKgPerSecond: massFlow,
    volumePercent,
    warnings: props.warnings,
    sources: props.sources,
  };
}
