// The settings of the analysis, their defaults and why each default is what it is. Every
// default is Heatpath's choice unless a line says otherwise; a maker's figure for the engine
// overrides the temperature thresholds.
import { TemperatureLogError } from '../errors.js';

/**
 * What is known of the engine the log came from. Leave a fact out (or null) when it is not known:
 * the analysis then words its findings for both possibilities rather than guessing.
 */
export interface EngineFacts {
  /** The engine has a switchable coolant pump (a shroud covers the impeller while it warms up). */
  readonly switchablePump?: boolean | null;
  /** The thermostat is map-controlled (a heater element the engine computer drives). */
  readonly mapControlledThermostat?: boolean | null;
}

export interface AnalyseTemperatureLogOptions extends EngineFacts {
  /**
   * Over-temperature threshold, °C. Default 110: above the 90–105 °C of normal running (common
   * practice); 115 when the thermostat is known to be map-controlled, above the 100–110 °C such
   * engines hold at part load (common practice).
   */
  readonly overTemperatureC?: number;
  /** Shortest time above the threshold that counts as an episode, s. Default 30. */
  readonly minEpisodeSeconds?: number;
  /** An episode ends only when the temperature falls this far below the threshold, K. Default 5. */
  readonly episodeHysteresisK?: number;
  /** Moving-average window the threshold crossings are found on, s (0: the readings as they are). Default 10. */
  readonly episodeSmoothingSeconds?: number;
  /** Moving-average window for the warm-up and opening, s. Default 30. */
  readonly smoothingSeconds?: number;
  /** Window over which the rise rate before and after a moment is measured, s. Default 60. */
  readonly slopeWindowSeconds?: number;
  /** The rise has flattened when the rate after a moment is below this share of the rate before. Default 0.3. */
  readonly openingSlopeFraction?: number;
  /** Smallest rise from the coldest reading that counts as a warm-up, K. Default 15. */
  readonly minWarmUpRiseK?: number;
  /** Slowest rise that counts as warming up, K/min. Default 1. */
  readonly minWarmUpRateKPerMin?: number;
  /** A flattening is not the opening when the rise resumes by this much within the resume window, K. Default 6. */
  readonly resumeRiseK?: number;
  /** How long after a flattening the analysis watches for the rise resuming, s. Default 300. */
  readonly resumeWindowSeconds?: number;
  /** A warm-up has to start below this temperature, °C; a log that starts warmer has no warm-up. Default 67. */
  readonly coldStartBelowC?: number;
  /** Temperature whose time of reaching is reported (the slow-warm-up step asks for 80 °C). Default 80. */
  readonly warmUpTargetC?: number;
  /** Smallest peak-to-trough swing counted, K. Default 3. */
  readonly minSwingK?: number;
  /** Fewest full cycles in a row that count as swinging. Default 3. */
  readonly minSwingCycles?: number;
  /** Longest cycle counted as a swing, s. Default 900. */
  readonly maxSwingPeriodSeconds?: number;
  /** Moving-average window for swing detection, s. Default 10. */
  readonly swingSmoothingSeconds?: number;
  /** Shortest stretch after the opening that gives a settled temperature, s. Default 600 (the step asks for ten minutes). */
  readonly minSettledSeconds?: number;
  /** Time left out after the opening before the settled temperature is taken, s. Default 60. */
  readonly settleDelaySeconds?: number;
}

type NumericOptionName = Exclude<keyof AnalyseTemperatureLogOptions, keyof EngineFacts>;

export type ResolvedAnalysisOptions = {
  readonly [K in NumericOptionName]-?: number;
} & {
  /** null: not known. */
  readonly [K in keyof EngineFacts]-?: boolean | null;
};

/** The over-temperature threshold for an engine known to have a map-controlled thermostat, °C. */
export const MAP_CONTROLLED_OVER_TEMPERATURE_C = 115;

// Why the defaults that are not obvious are what they are:
// - episodeHysteresisK 5: a thermostat regulating at the top of the map-controlled band
//   (105–110 °C, common practice) crosses 110 °C again and again; a 5 K hysteresis takes the
//   coolant back to 105 °C, the top of conventional normal running, before a hot spell counts as
//   over, so such running is one episode rather than many. Where an episode ends is still its
//   last crossing back under the threshold, so well-separated episodes keep their durations.
// - resumeWindowSeconds 300: a switchable pump's shroud releasing (around 70 °C) or a stop in
//   traffic stalls the warm-up for a minute or two before it climbs on, and after a release the
//   whole circuit's coolant warms, more slowly (2–4 K/min); five minutes sees that climb pass
//   the 6 K of resumeRiseK. An over-temperature episode starting within five minutes of the
//   opening can hide the opening (reported as not found, never as an opening up there).
// - coldStartBelowC 67: 15 K (minWarmUpRiseK) below the lowest usual opening temperature,
//   82 °C. A log that starts warmer cannot show enough of the warm-up to tell an opening from an
//   over-temperature plateau or a pause in driving.
export const DEFAULT_ANALYSIS_OPTIONS: ResolvedAnalysisOptions = {
  overTemperatureC: 110,
  minEpisodeSeconds: 30,
  episodeHysteresisK: 5,
  episodeSmoothingSeconds: 10,
  smoothingSeconds: 30,
  slopeWindowSeconds: 60,
  openingSlopeFraction: 0.3,
  minWarmUpRiseK: 15,
  minWarmUpRateKPerMin: 1,
  resumeRiseK: 6,
  resumeWindowSeconds: 300,
  coldStartBelowC: 67,
  warmUpTargetC: 80,
  minSwingK: 3,
  minSwingCycles: 3,
  maxSwingPeriodSeconds: 900,
  swingSmoothingSeconds: 10,
  minSettledSeconds: 600,
  settleDelaySeconds: 60,
  switchablePump: null,
  mapControlledThermostat: null,
};

const ENGINE_FACTS = new Set<string>(['switchablePump', 'mapControlledThermostat']);

// Temperatures may be any finite number; everything else must be positive (or zero where a zero
// means "none", as for the hysteresis and the settle delay).
const MAY_BE_ANY = new Set(['overTemperatureC', 'warmUpTargetC', 'coldStartBelowC']);
const MAY_BE_ZERO = new Set([
  'episodeHysteresisK',
  'episodeSmoothingSeconds',
  'minEpisodeSeconds',
  'settleDelaySeconds',
]);

export function resolveAnalysisOptions(
  options: AnalyseTemperatureLogOptions,
): ResolvedAnalysisOptions {
  const resolved: Record<string, number | boolean | null> = { ...DEFAULT_ANALYSIS_OPTIONS };
  if (options.mapControlledThermostat === true && options.overTemperatureC === undefined) {
    resolved['overTemperatureC'] = MAP_CONTROLLED_OVER_TEMPERATURE_C;
  }
  for (const [name, value] of Object.entries(options) as [string, unknown][]) {
    if (value === undefined) {
      continue;
    }
    if (!(name in DEFAULT_ANALYSIS_OPTIONS)) {
      throw new TemperatureLogError('invalid-options', `Unknown analysis option "${name}".`);
    }
    if (ENGINE_FACTS.has(name)) {
      if (value !== null && typeof value !== 'boolean') {
        throw new TemperatureLogError(
          'invalid-options',
          `The analysis option "${name}" must be true, false or left out.`,
        );
      }
      resolved[name] = value;
      continue;
    }
    const ok =
      typeof value === 'number' &&
      Number.isFinite(value) &&
      (MAY_BE_ANY.has(name) || value > 0 || (MAY_BE_ZERO.has(name) && value === 0));
    if (!ok) {
      throw new TemperatureLogError(
        'invalid-options',
        `The analysis option "${name}" must be a ${MAY_BE_ANY.has(name) ? 'finite' : 'positive'} number.`,
      );
    }
    resolved[name] = value;
  }
  if (Number(resolved['openingSlopeFraction'] ?? 0) >= 1) {
    throw new TemperatureLogError('invalid-options', 'openingSlopeFraction must be below 1.');
  }
  return resolved as ResolvedAnalysisOptions;
}
