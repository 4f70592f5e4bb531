// Heat carried away by the coolant across a radiator, heater core or engine, from a flow reading
// and the temperatures either side: Q = ṁ·cp·ΔT. Useful to compare a radiator's duty with what
// the engine should be rejecting.
import { convertPercent } from './concentration-basis.js';
import { coolantProperties } from './coolant-properties.js';
import { CoolantInputError } from './errors.js';
import { readBasis, readGlycol } from './glycol-options.js';
import type { Basis, Glycol } from './glycol-tables.js';
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

/** Heat flow in kW with properties at the mean of inlet and outlet temperatures. */
export function heatFlow(options: HeatFlowOptions): HeatFlowResult {
  const glycol = readGlycol(options.glycol);
  const basis = readBasis(options.basis);
  const percent = toCanonical(options.percent, 'percent', 'percent');
  const flow = toCanonical(options.litresPerMinute, 'volumeFlow', 'litresPerMinute');
  const inlet = toCanonical(options.inletCelsius, 'temperature', 'inletCelsius');
  const outlet = toCanonical(options.outletCelsius, 'temperature', 'outletCelsius');

  if (glycol === 'propylene' && percent > 0) {
    throw new CoolantInputError(
      'glycol',
      'No cited density and specific-heat table for propylene glycol is in Heatpath yet, so no heat flow is computed for it.',
    );
  }
  const volumePercent = convertPercent(glycol, percent, basis, 'volume');
  if (volumePercent === null) {
    throw new CoolantInputError('percent', `${percent} ${basis} % is beyond the handbook table.`);
  }
  const meanCelsius = (inlet + outlet) / 2;
  const props = coolantProperties(volumePercent, meanCelsius);
  // L/min → m³/s, then kg/s.
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
