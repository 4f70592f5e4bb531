// The settings of the analysis, their defaults and why each default is what it is. Every
// default is Heatpath's choice unless a line says otherwise; a maker's figure for the engine
// overrides the temperature thresholds.
import { TemperatureLogError } from '../errors.js';

export interface AnalyseTemperatureLogOptions {
  /** Over-temperature threshold, °C. Default 110: above the 90–105 °C of normal running (common practice). */
  readonly overTemperatureC?: number;
  /** Shortest time above the threshold that counts as an episode, s. Default 30. */
  readonly minEpisodeSeconds?: number;
  /** An episode ends only when the temperature falls this far below the threshold, K. Default 2. */
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
  /** A flattening is not the opening when the rise resumes by this much within two slope windows, K. Default 6. */
  readonly resumeRiseK?: number;
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

export type ResolvedAnalysisOptions = {
  readonly [K in keyof AnalyseTemperatureLogOptions]-?: number;
};

export const DEFAULT_ANALYSIS_OPTIONS: ResolvedAnalysisOptions = {
  overTemperatureC: 110,
  minEpisodeSeconds: 30,
  episodeHysteresisK: 2,
  episodeSmoothingSeconds: 10,
  smoothingSeconds: 30,
  slopeWindowSeconds: 60,
  openingSlopeFraction: 0.3,
  minWarmUpRiseK: 15,
  minWarmUpRateKPerMin: 1,
  resumeRiseK: 6,
  warmUpTargetC: 80,
  minSwingK: 3,
  minSwingCycles: 3,
  maxSwingPeriodSeconds: 900,
  swingSmoothingSeconds: 10,
  minSettledSeconds: 600,
  settleDelaySeconds: 60,
};

// Temperatures may be any finite number; everything else must be positive (or zero where a zero
// means "none", as for the hysteresis and the settle delay).
const MAY_BE_ANY = new Set(['overTemperatureC', 'warmUpTargetC']);
const MAY_BE_ZERO = new Set([
  'episodeHysteresisK',
  'episodeSmoothingSeconds',
  'minEpisodeSeconds',
  'settleDelaySeconds',
]);

export function resolveAnalysisOptions(
  options: AnalyseTemperatureLogOptions,
): ResolvedAnalysisOptions {
  const resolved: Record<string, number> = { ...DEFAULT_ANALYSIS_OPTIONS };
  for (const [name, value] of Object.entries(options)) {
    if (value === undefined) {
      continue;
    }
    if (!(name in DEFAULT_ANALYSIS_OPTIONS)) {
      throw new TemperatureLogError('invalid-options', `Unknown analysis option "${name}".`);
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
  if ((resolved['openingSlopeFraction'] ?? 0) >= 1) {
    throw new TemperatureLogError('invalid-options', 'openingSlopeFraction must be below 1.');
  }
  return resolved as ResolvedAnalysisOptions;
}
