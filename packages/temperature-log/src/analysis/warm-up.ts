// Warm-up, thermostat opening and rate of rise, from one search for the moment the rise flattens.
//
// Method (Heatpath's): the coolant series is put on an even step and smoothed with a centred
// moving average (30 s). At each moment the rise rate over the window before (60 s) is compared
// with the rate over the window after. The thermostat is taken to open at the first moment where
// - the rate before is at least 1 K/min (the engine is warming),
// - the rate after is below 30 % of the rate before (the rise has flattened),
// - the coolant has risen at least 15 K from its coldest reading so far (a real warm-up),
// refined to the moment of the sharpest change (rate before minus rate after, largest) within
// two windows, and kept only if the rise does not resume by more than 6 K within two windows
// (a driver stopping for a minute flattens the curve too). For a rise that stops sharply the
// smoothed rate halves exactly at the knee, so this finds the knee without bias; the smoothed
// temperature there lies below the true opening temperature by about rate × window / 8
// (0.4 K at 6 K/min and 30 s).
// The warm-up starts where the rise leaves the coldest reading: the last moment within 1 K of
// it, extrapolated back along the local rise to the coldest level, so a flat lead-in with the
// engine off is not counted.
import type { ResolvedAnalysisOptions } from './analysis-options.js';
import { STATUS, TYPICAL_OPENING_C } from './result-basis.js';
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
}

const WITHIN_OF_COLDEST_K = 1;

function basisTexts(o: ResolvedAnalysisOptions): {
  warmUp: ResultBasis;
  opening: ResultBasis;
  rise: ResultBasis;
} {
  const knee = `the first moment the smoothed coolant temperature (${o.smoothingSeconds} s moving average) stops rising: the rate over the next ${o.slopeWindowSeconds} s falls below ${Math.round(o.openingSlopeFraction * 100)} % of the rate over the ${o.slopeWindowSeconds} s before, after a rise of at least ${o.minWarmUpRiseK} K at ${o.minWarmUpRateKPerMin} K/min or more`;
  return {
    warmUp: {
      method: `From the moment the rise leaves the coldest reading to ${knee}.`,
      status: STATUS.heatpathMethod,
    },
    opening: {
      method: `The smoothed temperature at ${knee}. Reads up to about half a kelvin low on a fast warm-up.`,
      status: `${STATUS.heatpathMethod} Usual opening temperatures are ${TYPICAL_OPENING_C.min}–${TYPICAL_OPENING_C.max} °C (published trade textbook site; medium confidence); the thermostat's stamped figure overrides.`,
    },
    rise: {
      method: `Average: the rise from the coldest reading to the opening divided by the warm-up time. Fastest: the largest rise over ${o.slopeWindowSeconds} s during the warm-up, per minute.`,
      status: STATUS.heatpathMethod,
    },
  };
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
  const window = l * step;
  const minRate = o.minWarmUpRateKPerMin / 60;

  const prefixMin = new Float64Array(n);
  let low = Number.POSITIVE_INFINITY;
  for (let i = 0; i < n; i += 1) {
    low = Math.min(low, s[i] ?? low);
    prefixMin[i] = low;
  }
  const at = (i: number): number => s[i] ?? Number.NaN;
  const before = (i: number): number => (at(i) - at(i - l)) / window;
  const after = (i: number): number => (at(i + l) - at(i)) / window;
  const flattens = (i: number): boolean => {
    const b = before(i);
    return (
      b >= minRate &&
      after(i) <= o.openingSlopeFraction * b &&
      at(i) - (prefixMin[i] ?? 0) >= o.minWarmUpRiseK
    );
  };

  let knee = -1;
  for (let i = l; i < n - l; i += 1) {
    if (!flattens(i)) {
      continue;
    }
    let best = i;
    for (let j = i; j <= Math.min(n - 1 - l, i + 2 * l); j += 1) {
      if (before(j) - after(j) > before(best) - after(best)) {
        best = j;
      }
    }
    let highest = at(best);
    for (let j = best; j <= Math.min(n - 1, best + 2 * l); j += 1) {
      highest = Math.max(highest, at(j));
    }
    if (highest - at(best) <= o.resumeRiseK) {
      knee = best;
      break;
    }
    i = best + 2 * l;
  }

  if (knee === -1) {
    let rise = 0;
    for (let i = 0; i < n; i += 1) {
      rise = Math.max(rise, at(i) - (prefixMin[i] ?? 0));
    }
    let reason: string;
    if (rise < o.minWarmUpRiseK) {
      reason = `The coolant never rose ${o.minWarmUpRiseK} K above its coldest reading (it started at ${round(at(0), 1)} °C), so there is no warm-up in this log.`;
    } else if (n > l && before(n - 1) >= minRate) {
      reason = `The coolant was still rising when the log ended (${round(at(n - 1), 1)} °C): the thermostat had not opened yet.`;
    } else {
      reason =
        'Heatpath found no clear point where the rise flattens; read the warm-up from the chart.';
    }
    return {
      warmUp: { found: false, reason, basis: basis.warmUp },
      opening: { found: false, reason, basis: basis.opening },
      riseRate: { found: false, reason, basis: basis.rise },
    };
  }

  const coldest = prefixMin[knee] ?? at(0);
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
  let compared: 'below' | 'within' | 'above' = 'within';
  if (openingC < TYPICAL_OPENING_C.min) {
    compared = 'below';
  } else if (openingC > TYPICAL_OPENING_C.max) {
    compared = 'above';
  }
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
      typicalRangeC: TYPICAL_OPENING_C,
      comparedWithTypical: compared,
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
  };
}
