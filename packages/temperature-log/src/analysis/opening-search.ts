// Finds where the warm-up's rise levels off (the thermostat opening) on the smoothed, evenly
// stepped coolant curve, and the stalls on the way that are not the opening.
//
// Rules (Heatpath's method; the trade facts are from cooling-diagnosis.md, common practice):
// - The opening is only looked for inside a warm-up the log contains: the rise must start below
//   `coldStartBelowC` and climb at least `minWarmUpRiseK`. A log that starts warm has none.
// - The search ends where the coolant first reaches the over-temperature threshold: a plateau up
//   there is an over-temperature episode, never a thermostat opening.
// - A candidate is a sharp flattening (the rate over the next window below `openingSlopeFraction`
//   of the rate over the window before, refined to the sharpest change within two windows) or,
//   for a rise that levels off gradually, the moment the rise has ended (under
//   `minWarmUpRateKPerMin` over the windows before and after), refined back to the sharpest slowing since
//   the warm-up (or the last stall) began. That is the knee, not the later settle point.
// - A candidate after which the rise resumes is a stall, not the opening: within
//   `resumeWindowSeconds` the coolant climbs more than `resumeRiseK` above it AND the rise
//   re-accelerates (the rate over a window climbs back by at least `minWarmUpRateKPerMin` from its
//   lowest since the candidate). A settling thermostat may carry the coolant a few kelvin higher,
//   but ever more slowly; a switchable pump's shroud releasing, or a stop in traffic, is followed
//   by the climb picking up again.
import type { ResolvedAnalysisOptions } from './analysis-options.js';

export interface WarmUpCurve {
  /** The smoothed coolant temperature, one value per grid point. */
  readonly s: Float64Array;
  /** Points per slope window. */
  readonly l: number;
  /** Seconds per grid point. */
  readonly step: number;
}

export interface Stall {
  /** Grid index of the moment the rise stalled. */
  readonly index: number;
  /** Smoothed temperature there, °C. */
  readonly temperatureC: number;
  /** How far the smoothed temperature fell after the stall before climbing on, K (0: no fall). */
  readonly dipK: number;
  /** Grid index where the climb had picked up again. */
  readonly resumedIndex: number;
}

export type NoOpeningCause =
  'starts-warm' | 'no-rise' | 'over-threshold' | 'still-rising' | 'unclear';

export type OpeningSearch =
  | {
      readonly found: true;
      readonly knee: number;
      /** Whether the knee was a sharp flattening or the end of a gradual levelling-off. */
      readonly shape: 'sharp' | 'gradual';
      /** The coldest smoothed temperature before the knee, °C. */
      readonly coldestC: number;
      readonly stalls: readonly Stall[];
    }
  | {
      readonly found: false;
      readonly cause: NoOpeningCause;
      readonly stalls: readonly Stall[];
      /** Grid index where the search stopped at the over-temperature threshold, or -1. */
      readonly thresholdIndex: number;
    };

export function curveRates(curve: WarmUpCurve): {
  at: (i: number) => number;
  before: (i: number) => number;
  after: (i: number) => number;
} {
  const { s, l, step } = curve;
  const window = l * step;
  const at = (i: number): number => s[i] ?? Number.NaN;
  return {
    at,
    before: (i) => (at(i) - at(i - l)) / window,
    after: (i) => (at(i + l) - at(i)) / window,
  };
}

export function prefixMinimum(s: Float64Array): Float64Array {
  const out = new Float64Array(s.length);
  let low = Number.POSITIVE_INFINITY;
  for (let i = 0; i < s.length; i += 1) {
    low = Math.min(low, s[i] ?? low);
    out[i] = low;
  }
  return out;
}

export function searchOpening(curve: WarmUpCurve, o: ResolvedAnalysisOptions): OpeningSearch {
  const { s, l, step } = curve;
  const n = s.length;
  const { at, before, after } = curveRates(curve);
  const minRate = o.minWarmUpRateKPerMin / 60;
  const prefixMin = prefixMinimum(s);
  const resumeSpan = Math.max(l, Math.round(o.resumeWindowSeconds / step));

  let thresholdIndex = -1;
  for (let i = 0; i < n; i += 1) {
    if (at(i) >= o.overTemperatureC) {
      thresholdIndex = i;
      break;
    }
  }
  const last = Math.min(n - 1 - l, thresholdIndex === -1 ? n - 1 : thresholdIndex);

  const inWarmUp = (i: number): boolean =>
    (prefixMin[i] ?? Number.POSITIVE_INFINITY) < o.coldStartBelowC &&
    at(i) - (prefixMin[i] ?? 0) >= o.minWarmUpRiseK;

  /** Where the rise picks up again after `from`, or -1 when it does not (see the header). */
  const resumesAt = (from: number): number => {
    const end = Math.min(n - 1 - l, from + resumeSpan);
    let highest = at(from);
    for (let j = from; j <= Math.min(n - 1, from + resumeSpan); j += 1) {
      highest = Math.max(highest, at(j));
    }
    if (highest - at(from) <= o.resumeRiseK) {
      return -1;
    }
    let slowest = Number.POSITIVE_INFINITY;
    for (let j = from; j <= end; j += 1) {
      const rate = after(j);
      slowest = Math.min(slowest, rate);
      if (rate >= minRate && rate - slowest >= minRate) {
        return j;
      }
    }
    return -1;
  };

  /** The moment of sharpest slowing (rate before minus rate after) in the warm-up, from..to. */
  const sharpest = (from: number, to: number): number => {
    let best = to;
    let drop = Number.NEGATIVE_INFINITY;
    for (let j = Math.max(from, l); j <= to; j += 1) {
      const d = before(j) - after(j);
      if (inWarmUp(j) && d > drop) {
        best = j;
        drop = d;
      }
    }
    return best;
  };

  const stalls: Stall[] = [];
  let stretchStart = l;
  for (let i = l; i <= last; i += 1) {
    if (!inWarmUp(i)) {
      continue;
    }
    const b = before(i);
    const sharp = b >= minRate && after(i) <= o.openingSlopeFraction * b;
    // The climb has ended: slower than warming both over the window before and the one after
    // (the one before alone is slow while the coolant climbs back out of a dip).
    const ended = b < minRate && after(i) < minRate;
    if (!sharp && !ended) {
      continue;
    }
    const best = sharp ? sharpest(i, Math.min(last, i + 2 * l)) : sharpest(stretchStart, i);
    const resumed = resumesAt(best);
    if (resumed === -1) {
      return {
        found: true,
        knee: best,
        shape: sharp ? 'sharp' : 'gradual',
        coldestC: prefixMin[best] ?? at(0),
        stalls,
      };
    }
    // Carry on from where the coolant is back above the stall: a search inside the dip would
    // take the bottom of the dip, or the climb out of it, for a levelling-off.
    let back = resumed;
    while (back < last && at(back) <= at(best)) {
      back += 1;
    }
    let lowest = at(best);
    for (let j = best; j <= back; j += 1) {
      lowest = Math.min(lowest, at(j));
    }
    stalls.push({
      index: best,
      temperatureC: at(best),
      dipK: Math.max(0, at(best) - lowest),
      resumedIndex: back,
    });
    stretchStart = back;
    i = Math.max(i, back);
  }

  let coldest = Number.POSITIVE_INFINITY;
  let rise = 0;
  for (let i = 0; i < n; i += 1) {
    coldest = Math.min(coldest, at(i));
    rise = Math.max(rise, at(i) - (prefixMin[i] ?? 0));
  }
  let cause: NoOpeningCause;
  if (coldest >= o.coldStartBelowC) {
    cause = 'starts-warm';
  } else if (rise < o.minWarmUpRiseK) {
    cause = 'no-rise';
  } else if (thresholdIndex !== -1) {
    cause = 'over-threshold';
  } else if (n > l && before(n - 1) >= minRate) {
    cause = 'still-rising';
  } else {
    cause = 'unclear';
  }
  return { found: false, cause, stalls, thresholdIndex };
}
