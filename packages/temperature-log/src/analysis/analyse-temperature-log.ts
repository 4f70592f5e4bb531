// Runs every analysis over one parsed log. Pure: the same series and options always give the
// same result, and nothing is read or written.
import { TemperatureLogError } from '../errors.js';
import { resolveAnalysisOptions } from './analysis-options.js';
import type { AnalyseTemperatureLogOptions, ResolvedAnalysisOptions } from './analysis-options.js';
import { engineRunning, runningOnGrid } from './engine-running.js';
import { heatSoakNotes } from './heat-soak.js';
import { findAmbient, findPeak, findSettled, findTimeToTarget } from './log-readings.js';
import type {
  AmbientResult,
  PeakResult,
  SettledResult,
  TimeToTargetResult,
} from './log-readings.js';
import { findOverTemperature } from './over-temperature.js';
import type { OverTemperatureResult } from './over-temperature.js';
import { readStalls } from './shroud-release.js';
import type { ShroudReleaseResult } from './shroud-release.js';
import { findSwings } from './swings.js';
import type { SwingResult } from './swings.js';
import { medianInterval, uniformGrid } from './uniform-grid.js';
import { analyseWarmUp } from './warm-up.js';
import type { OpeningResult, RiseRateResult, WarmUpResult } from './warm-up.js';

/** What the analysis needs of a series: a parsed TemperatureSeries is one. */
export interface AnalysableSeries {
  readonly times: readonly number[];
  readonly coolantC: readonly number[];
  readonly ambientC?: readonly (number | null)[] | null;
  readonly fanDuty?: readonly (number | null)[] | null;
  /** Engine speed, rpm: tells running from switched off (heat soak is left out of episodes). */
  readonly engineSpeedRpm?: readonly (number | null)[] | null;
}

/**
 * Bumped whenever the analysis rules change what it finds, so a stored analysis from before can
 * be recognised and worked out again (1: before this field; 2: opening only inside a warm-up,
 * shroud release, map-controlled thermostat, engine speed).
 */
export const ANALYSIS_VERSION = 2;

export interface TemperatureLogAnalysis {
  readonly version: number;
  readonly log: {
    readonly readings: number;
    readonly durationSeconds: number;
    readonly medianIntervalSeconds: number;
  };
  readonly peak: PeakResult;
  readonly warmUp: WarmUpResult;
  readonly opening: OpeningResult;
  readonly riseRate: RiseRateResult;
  /** A switchable pump's shroud releasing (a stall in the warm-up), as far as the log shows it. */
  readonly shroudRelease: ShroudReleaseResult;
  readonly timeToTarget: TimeToTargetResult;
  readonly settled: SettledResult;
  readonly overTemperature: OverTemperatureResult;
  readonly swings: SwingResult;
  readonly ambient: AmbientResult;
  /** Caveats about this log as a whole. */
  readonly notes: readonly string[];
  readonly options: ResolvedAnalysisOptions;
}

// Readings further apart than this may hide a short episode between two of them.
const COARSE_INTERVAL_SECONDS = 10;

function checkSeries(series: AnalysableSeries): void {
  const { times, coolantC } = series;
  if (times.length !== coolantC.length || times.length < 2) {
    throw new TemperatureLogError(
      'invalid-options',
      'The series needs at least two readings, with one time per coolant temperature.',
    );
  }
  for (let i = 0; i < times.length; i += 1) {
    const t = times[i] ?? Number.NaN;
    if (
      !Number.isFinite(t) ||
      !Number.isFinite(coolantC[i] ?? Number.NaN) ||
      (i > 0 && t < (times[i - 1] ?? t))
    ) {
      throw new TemperatureLogError(
        'invalid-options',
        `The series is not analysable at reading ${i}: times must be finite and never decrease, temperatures finite.`,
      );
    }
  }
  if ((times[times.length - 1] ?? 0) <= (times[0] ?? 0)) {
    throw new TemperatureLogError('invalid-options', 'The series covers no time.');
  }
}

export function analyseTemperatureLog(
  series: AnalysableSeries,
  options: AnalyseTemperatureLogOptions = {},
): TemperatureLogAnalysis {
  checkSeries(series);
  const o = resolveAnalysisOptions(options);
  const { times, coolantC } = series;
  const grid = uniformGrid(times, coolantC);
  const running = engineRunning(times.length, series.engineSpeedRpm);
  const warm = analyseWarmUp(grid, o);
  const overTemperature = findOverTemperature(
    grid,
    times,
    coolantC,
    o,
    running.known ? runningOnGrid(times, running, grid.start, grid.step, grid.values.length) : null,
  );
  const openedAt = warm.opening.found ? warm.opening.atSeconds : null;
  const stalls = readStalls({
    stalls: warm.stalls,
    timeAt: (index) => grid.start + index * grid.step,
    switchablePump: o.switchablePump,
    openingC: warm.opening.found ? warm.opening.temperatureC : null,
    warmUpFound: warm.warmUp.found,
  });
  const fan = series.fanDuty ?? null;
  const swings = findSwings(
    grid,
    openedAt ?? times[0] ?? 0,
    o,
    fan === null ? null : { times, values: fan },
  );
  const interval = medianInterval(times);
  const notes: string[] = [];
  if (interval > COARSE_INTERVAL_SECONDS) {
    notes.push(
      `Readings are ${Math.round(interval)} s apart: short over-temperature episodes and fast swings can fall between them.`,
    );
  }
  notes.push(...stalls.notes);
  notes.push(
    ...heatSoakNotes({
      times,
      coolantC,
      running,
      episodes: overTemperature.episodes,
      thresholdC: overTemperature.thresholdC,
    }),
  );
  return {
    version: ANALYSIS_VERSION,
    log: {
      readings: times.length,
      durationSeconds: (times[times.length - 1] ?? 0) - (times[0] ?? 0),
      medianIntervalSeconds: interval,
    },
    peak: findPeak(times, coolantC, running),
    warmUp: warm.warmUp,
    opening: warm.opening,
    riseRate: warm.riseRate,
    shroudRelease: stalls.shroudRelease,
    timeToTarget: findTimeToTarget(times, coolantC, o),
    settled: findSettled(times, coolantC, openedAt, overTemperature.episodes, o, running),
    overTemperature,
    swings,
    ambient: findAmbient(series.ambientC),
    notes,
    options: o,
  };
}
