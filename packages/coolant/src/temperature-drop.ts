// Judges the temperature difference across the engine, radiator or heater core, the quick
// infrared check that separates a circulation problem from an air-side (radiator, fan) problem.
import { COOLANT_READING_LIMITS, isPlausibleCoolantCelsius } from './coolant-temperature.js';
import { formatFigure } from './display-rounding.js';
import { CoolantInputError } from './errors.js';
import {
  ENGINE_TEMPERATURE_DIFFERENCE,
  HEATPATH_WORKING_BAND,
  THERMOSTAT_OPENING,
} from './sources.js';
import type { SourceNote } from './sources.js';
import { toCanonical } from './units.js';
import type { QuantityInput } from './units.js';
import { warning } from './warnings.js';
import type { CoolantWarning } from './warnings.js';

export type Circuit = 'radiator' | 'engine' | 'heater';

export type TemperatureDropVerdict =
  'normal' | 'low-flow-suspected' | 'air-side-suspected' | 'implausible';

export interface AssessTemperatureDropOptions {
  readonly circuit: Circuit;
  readonly inletCelsius: QuantityInput;
  readonly outletCelsius: QuantityInput;
}

export interface TemperatureDropRule {
  readonly text: string;
  /** Differences inside this band (K, inclusive) are judged normal. */
  readonly normalBandKelvin: { readonly min: number; readonly max: number };
  /** The published rule the band is built around. */
  readonly source: SourceNote;
  /** Where the band's edges come from. */
  readonly bandSource: SourceNote;
}

export interface TemperatureDropResult {
  readonly verdict: TemperatureDropVerdict;
  /** Difference in the direction heat should flow (K): outlet − inlet for the engine, inlet − outlet otherwise. */
  readonly differenceKelvin: number;
  readonly explanation: string;
  readonly rule: TemperatureDropRule;
  readonly warnings: readonly CoolantWarning[];
}

// Liquid coolant cannot be colder than the coldest mix's freezing point (−51.1 °C, PG at 60 mass %)
// or much hotter than its boiling point under a cap; readings outside these are instrument errors.
// An infrared reading on a hose is good to a degree or two; a "reversed" difference inside that is
// noise, beyond it the readings or the circuit choice are wrong.
const REVERSED_TOLERANCE_KELVIN = 2;
// Below this the thermostat may not have opened (it usually opens at 82–91 °C).
const THERMOSTAT_CHECK_CELSIUS = 80;

const BANDS: Record<Circuit, { readonly min: number; readonly max: number }> = {
  engine: { min: 3, max: 10 },
  radiator: { min: 3, max: 10 },
  heater: { min: 3, max: 15 },
};

const RULE_TEXT: Record<Circuit, string> = {
  engine:
    'Engine-out minus engine-in is around 5–6 K when circulation is right; much more points to a flow problem, much less to an air-side (radiator or fan) problem. Heatpath judges 3–10 K as normal to allow for infrared reading error.',
  radiator:
    "In steady running with the thermostat open the radiator gives up what the engine adds, so the engine's 5–6 K rule is applied to the radiator's drop: much more points to weak circulation or a restricted core, much less to an air-side (fan, blocked fins) problem. Heatpath judges 3–10 K as normal.",
  heater:
    'No published figure for the heater core was found; Heatpath uses 3–15 K with the blower on full heat as a prompt to look further: a large drop suggests low flow or air in the heater loop, a very small one that air is not passing the core (blower, flap, blocked fins).',
};

function readCircuit(value: unknown): Circuit {
  if (value === 'radiator' || value === 'engine' || value === 'heater') {
    return value;
  }
  throw new CoolantInputError('circuit', 'Choose the circuit: "radiator", "engine" or "heater".');
}

/** Verdict on the temperature difference across one part of the cooling system. */
export function assessTemperatureDrop(
  options: AssessTemperatureDropOptions,
): TemperatureDropResult {
  const circuit = readCircuit(options.circuit);
  const inlet = toCanonical(options.inletCelsius, 'temperature', 'inletCelsius');
  const outlet = toCanonical(options.outletCelsius, 'temperature', 'outletCelsius');
  const band = BANDS[circuit];
  const rule: TemperatureDropRule = {
    text: RULE_TEXT[circuit],
    normalBandKelvin: band,
    source: circuit === 'heater' ? HEATPATH_WORKING_BAND : ENGINE_TEMPERATURE_DIFFERENCE,
    bandSource: HEATPATH_WORKING_BAND,
  };
  const difference = circuit === 'engine' ? outlet - inlet : inlet - outlet;
  const warnings: CoolantWarning[] = [];
  if (circuit === 'heater') {
    warnings.push(
      warning(
        'no-published-band',
        'The heater-core band is Heatpath’s own, not a published figure: use it as a prompt, not a finding.',
      ),
    );
  }

  const outOfRange = [inlet, outlet].some((t) => !isPlausibleCoolantCelsius(t));
  if (outOfRange) {
    return {
      verdict: 'implausible',
      differenceKelvin: difference,
      explanation: `A reading outside ${COOLANT_READING_LIMITS.minCelsius} to ${COOLANT_READING_LIMITS.maxCelsius} °C is not liquid coolant; check the instrument and where it was aimed.`,
      rule,
      warnings,
    };
  }
  if (difference < -REVERSED_TOLERANCE_KELVIN) {
    return {
      verdict: 'implausible',
      differenceKelvin: difference,
      explanation:
        circuit === 'engine'
          ? 'The coolant leaving the engine reads cooler than the coolant entering it: the readings are swapped, taken on the wrong hoses, or one is wrong.'
          : 'The outlet reads hotter than the inlet: the readings are swapped, taken on the wrong hoses, or one is wrong.',
      rule,
      warnings,
    };
  }
  if (Math.max(inlet, outlet) < THERMOSTAT_CHECK_CELSIUS) {
    warnings.push(
      warning(
        'thermostat-may-be-closed',
        `The hotter reading is below ${THERMOSTAT_CHECK_CELSIUS} °C, so the thermostat may not have opened yet (usually 82–91 °C; ${THERMOSTAT_OPENING.status}). Judge the difference at operating temperature.`,
      ),
    );
  }
  let verdict: TemperatureDropVerdict;
  let explanation: string;
  if (difference > band.max) {
    verdict = 'low-flow-suspected';
    explanation = `${formatFigure(difference, 'temperatureDifference')} is above the ${band.min}–${band.max} K band: the coolant is moving slowly enough to give up (or take up) much more heat than usual. Suspect circulation: pump or its shroud, thermostat, air lock, restriction.`;
  } else if (difference < band.min) {
    verdict = 'air-side-suspected';
    explanation = `${formatFigure(difference, 'temperatureDifference')} is below the ${band.min}–${band.max} K band: the coolant circulates but little heat changes hands across this part. Suspect the air side: fan, blocked radiator fins, airflow.`;
  } else {
    verdict = 'normal';
    explanation = `${formatFigure(difference, 'temperatureDifference')} is within the ${band.min}–${band.max} K band.`;
  }
  return { verdict, differenceKelvin: difference, explanation, rule, warnings };
}
