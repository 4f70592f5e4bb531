// Warm-up, thermostat opening and rate of rise, from one search for the moment the warm-up's
// rise levels off (opening-search.ts has the rules: only inside a warm-up the log contains,
// never at or above the over-temperature threshold, stalls after which the climb resumes left
// out). For a rise that stops sharply the smoothed rate halves exactly at the knee, so the time
// has no bias; the smoothed temperature there lies below the true opening temperature by about
// rate × window / 8 (0.4 K at 6 K/min and 30 s).
// The warm-up starts where the rise leaves the coldest reading: the last moment within 1 K of
// it, extrapolated back along the local rise to the coldest level, so a flat lead-in with the
// engine off is not counted.
import type { ResolvedAnalysisOptions } from './analysis-options.js';
import { compareOpening } from './opening-comparison.js';
import { curveRates, searchOpening } from './opening-search.js';
import type { NoOpeningCause, Stall } from './opening-search.js';
import { STATUS } from './result-basis.js';
import type { ResultBasis } from './result-basis.js';
import { halfWidthFor, movingAverage } from './uniform-grid.js';
import type { UniformGrid } from './uniform-grid.js';

export type NotFound = {
  readonly found: false;
  readonly reason: string;
  readonly basis: ResultBasis;
};

export type WarmUpResult =
  | {
      readonly found: true;
      readonly startSeconds: number;
      readonly openingSeconds: number;
      /** Time from the start of the rise to the opening. */
      readonly seconds: number;
      readonly fromC: number;
      readonly basis: ResultBasis;
    }
  | NotFound;

export type OpeningResult =
  | {
      readonly found: true;
      readonly temperatureC: number;
      readonly atSeconds: number;
      readonly typicalRangeC: { readonly min: number; readonly max: number };
      readonly comparedWithTypical: 'below' | 'within' | 'above';
      /** 'gradual': the rise levelled off slowly and the opening is where it slowed most. */
      readonly shape: 'sharp' | 'gradual';
      /** What the comparison means for this engine, when it needs saying; null otherwise. */
      readonly note: string | null;
      readonly basis: ResultBasis;
    }
  | NotFound;

export type RiseRateResult =
  | {
      readonly found: true;
      /** (opening temperature − starting temperature) / warm-up time. */
      readonly averageKPerMin: number;
      /** The fastest rise over one slope window during the warm-up. */
      readonly maxKPerMin: number;
      readonly fromSeconds: number;
      readonly toSeconds: number;
      readonly basis: ResultBasis;
    }
  | NotFound;

export interface WarmUpAnalysis {
  readonly warmUp: WarmUpResult;
  readonly opening: OpeningResult;
  readonly riseRate: RiseRateResult;
  /** Stalls in the warm-up after which the climb resumed: not the opening. */
  readonly stalls: readonly Stall[];
}

const WITHIN_OF_COLDEST_K = 1;

function basisTexts(o: ResolvedAnalysisOptions): {
  warmUp: ResultBasis;
  opening: ResultBasis;
  rise: ResultBasis;
} {
  const knee = `the first moment the smoothed coolant temperature (${o.smoothingSeconds} s moving average) levels off in a warm-up that starts below ${o.coldStartBelowC} °C and climbs at least ${o.minWarmUpRiseK} K: where the rate over the next ${o.slopeWindowSeconds} s falls below ${Math.round(o.openingSlopeFraction * 100)} % of the rate over the ${o.slopeWindowSeconds} s before, or, for a gradual levelling-off, where it slowed most before the climb fell under ${o.minWarmUpRateKPerMin} K/min. Never at or above ${o.overTemperatureC} °C, and not a stall after which the climb resumes within ${Math.round(o.resumeWindowSeconds / 60)} minutes`;
  return {
    warmUp: {
      method: `From the moment the rise leaves the coldest reading to ${knee}.`,
      status: STATUS.heatpathMethod,
    },
    opening: {
      method: `The smoothed temperature at ${knee}. Reads up to about half a kelvin low on a fast warm-up.`,
      status: `${STATUS.heatpathMethod} Usual opening temperatures are 82–91 °C (published trade textbook site; medium confidence); map-controlled thermostats hold 100–110 °C at part load (common practice). The thermostat’s stamped figure overrides.`,
    },
    rise: {
      method: `Average: the rise from the coldest reading to the opening divided by the warm-up time. Fastest: the largest rise over ${o.slopeWindowSeconds} s during the warm-up, per minute.`,
      status: STATUS.heatpathMethod,
    },
  };
}

function noOpeningReason(
  cause: NoOpeningCause,
  o: ResolvedAnalysisOptions,
  first: number,
  last: number,
): string {
  switch (cause) {
    case 'starts-warm':
      return `The log starts with the engine already warm (${round(first, 1)} °C; a warm-up has to start below ${o.coldStartBelowC} °C), so the thermostat opening is not in this log.`;
    case 'no-rise':
      return `The coolant never rose ${o.minWarmUpRiseK} K above its coldest reading (it started at ${round(first, 1)} °C), so there is no warm-up in this log.`;
    case 'over-threshold':
      return `The coolant reached ${o.overTemperatureC} °C before its rise levelled off, so the log shows no clear opening; a level at or above ${o.overTemperatureC} °C is an over-temperature episode, not an opening.`;
    case 'still-rising':
      return `The coolant was still rising when the log ended (${round(last, 1)} °C): the thermostat had not opened yet.`;
    case 'unclear':
      return 'Heatpath found no clear point where the rise levels off; read the warm-up from the chart.';
  }
}

function round(value: number, places: number): number {
  const f = 10 ** places;
  return Math.round(value * f) / f;
}

export function analyseWarmUp(grid: UniformGrid, o: ResolvedAnalysisOptions): WarmUpAnalysis {
  const basis = basisTexts(o);
  const step = grid.step;
  const s = movingAverage(grid.values, halfWidthFor(o.smoothingSeconds, step));
  const n = s.length;
  const l = Math.max(1, Math.round(o.slopeWindowSeconds / step));
  const curve = { s, l, step };
  const { at, before } = curveRates(curve);
  const search = searchOpening(curve, o);

  if (!search.found) {
    const reason = noOpeningReason(search.cause, o, at(0), at(n - 1));
    return {
      warmUp: { found: false, reason, basis: basis.warmUp },
      opening: { found: false, reason, basis: basis.opening },
      riseRate: { found: false, reason, basis: basis.rise },
      stalls: search.stalls,
    };
  }

  const { knee, coldestC: coldest } = search;
  let leave = 0;
  for (let j = knee; j >= 0; j -= 1) {
    if (at(j) <= coldest + WITHIN_OF_COLDEST_K) {
      leave = j;
      break;
    }
  }
  const ahead = Math.min(knee, leave + l);
  const localRate = ahead > leave ? (at(ahead) - at(leave)) / ((ahead - leave) * step) : 0;
  const startOffset = Math.max(
    0,
    leave * step - (localRate > 0 ? (at(leave) - coldest) / localRate : 0),
  );
  const startSeconds = grid.start + startOffset;
  const openingSeconds = grid.start + knee * step;
  const openingC = at(knee);
  let maxRate = 0;
  for (let j = Math.max(l, Math.ceil(startOffset / step) + l); j <= knee; j += 1) {
    maxRate = Math.max(maxRate, before(j));
  }
  const seconds = openingSeconds - startSeconds;
  const comparison = compareOpening(openingC, o);
  return {
    warmUp: {
      found: true,
      startSeconds,
      openingSeconds,
      seconds,
      fromC: coldest,
      basis: basis.warmUp,
    },
    opening: {
      found: true,
      temperatureC: openingC,
      atSeconds: openingSeconds,
      typicalRangeC: comparison.typicalRangeC,
      comparedWithTypical: comparison.comparedWithTypical,
      shape: search.shape,
      note: comparison.note,
      basis: basis.opening,
    },
    riseRate: {
      found: true,
      averageKPerMin: seconds > 0 ? ((openingC - coldest) / seconds) * 60 : 0,
      maxKPerMin: maxRate * 60,
      fromSeconds: startSeconds,
      toSeconds: openingSeconds,
      basis: basis.rise,
    },
    stalls: search.stalls,
  };
}
