// Temperature swings that suggest the fan cycling or the thermostat hunting.
//
// Method (Heatpath's): the coolant series, evenly stepped and lightly smoothed (10 s moving
// average), is reduced to its turning points, keeping only reversals of at least the smallest
// swing (3 K): a peak is confirmed once the coolant has fallen 3 K from it, a trough once it has
// risen 3 K. Consecutive turning points form one swinging stretch while each half-cycle is
// shorter than half the longest period (900 s) and neither far larger nor far longer (2.5×)
// than the stretch's median half-cycle, so the warm-up ramp or one over-temperature episode
// does not join it. A stretch with at least 3 full cycles is reported with its median
// peak-to-trough amplitude and median period (peak to next peak).
// With a fan channel the stretch says whether the fan runs harder while the coolant falls: then
// the swings follow the fan (fan cycling); if not, the thermostat hunting (or air in the
// circuit) is the likelier reading. Without a fan channel it cannot tell the two apart.
import type { ResolvedAnalysisOptions } from './analysis-options.js';
import type { ResultBasis } from './result-basis.js';
import { halfWidthFor, movingAverage } from './uniform-grid.js';
import type { UniformGrid } from './uniform-grid.js';

export type SwingSuggestion = 'fan-cycling' | 'thermostat-hunting' | 'fan-or-thermostat';

export interface SwingEpisode {
  readonly startSeconds: number;
  readonly endSeconds: number;
  readonly cycles: number;
  /** Median peak-to-trough swing, K. */
  readonly amplitudeK: number;
  /** Median time from one peak to the next, s. */
  readonly periodSeconds: number;
  readonly meanC: number;
  readonly minC: number;
  readonly maxC: number;
  /** Whether the fan runs harder while the coolant falls; null without a fan channel. */
  readonly fanFollows: boolean | null;
  readonly suggestion: SwingSuggestion;
  readonly note: string;
}

export interface SwingResult {
  readonly episodes: readonly SwingEpisode[];
  readonly basis: ResultBasis;
}

interface TurningPoint {
  readonly index: number;
  readonly value: number;
  readonly kind: 'peak' | 'trough';
}

// How far a half-cycle may stray from the stretch's median before it ends the stretch.
const STRAY_FACTOR = 2.5;
// Share of the fan's range by which it must run harder on the falls to "follow" the swings.
const FAN_FOLLOW_SHARE = 0.25;

function median(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1
    ? (sorted[mid] ?? Number.NaN)
    : ((sorted[mid - 1] ?? Number.NaN) + (sorted[mid] ?? Number.NaN)) / 2;
}

function turningPoints(s: Float64Array, from: number, minSwing: number): TurningPoint[] {
  const points: TurningPoint[] = [];
  let direction: 0 | 1 | -1 = 0;
  let hi = from;
  let lo = from;
  for (let i = from + 1; i < s.length; i += 1) {
    const v = s[i] ?? 0;
    if (v > (s[hi] ?? 0)) {
      hi = i;
    }
    if (v < (s[lo] ?? 0)) {
      lo = i;
    }
    if (direction >= 0 && (s[hi] ?? 0) - v >= minSwing && hi < i) {
      if (direction === 0 && lo < hi) {
        points.push({ index: lo, value: s[lo] ?? 0, kind: 'trough' });
      }
      points.push({ index: hi, value: s[hi] ?? 0, kind: 'peak' });
      direction = -1;
      lo = i;
    } else if (direction <= 0 && v - (s[lo] ?? 0) >= minSwing && lo < i) {
      if (direction === 0 && hi < lo) {
        points.push({ index: hi, value: s[hi] ?? 0, kind: 'peak' });
      }
      points.push({ index: lo, value: s[lo] ?? 0, kind: 'trough' });
      direction = 1;
      hi = i;
    }
  }
  return points;
}

// Splits the turning points into stretches of regular swinging.
function stretches(
  points: readonly TurningPoint[],
  step: number,
  maxHalf: number,
): TurningPoint[][] {
  const byGap: TurningPoint[][] = [];
  let current: TurningPoint[] = [];
  for (const p of points) {
    const last = current[current.length - 1];
    if (last !== undefined && (p.index - last.index) * step > maxHalf) {
      byGap.push(current);
      current = [];
    }
    current.push(p);
  }
  byGap.push(current);

  const out: TurningPoint[][] = [];
  for (const run of byGap) {
    if (run.length < 3) {
      continue;
    }
    const halves = run.slice(1).map((p, k) => ({
      amplitude: Math.abs(p.value - (run[k]?.value ?? p.value)),
      duration: (p.index - (run[k]?.index ?? p.index)) * step,
    }));
    const typicalAmplitude = median(halves.map((h) => h.amplitude));
    const typicalDuration = median(halves.map((h) => h.duration));
    let piece: TurningPoint[] = [run[0] as TurningPoint];
    halves.forEach((h, k) => {
      const next = run[k + 1] as TurningPoint;
      const strays =
        h.amplitude > STRAY_FACTOR * typicalAmplitude ||
        h.duration > STRAY_FACTOR * typicalDuration;
      if (strays) {
        out.push(piece);
        piece = [next];
      } else {
        piece.push(next);
      }
    });
    out.push(piece);
  }
  return out;
}

interface FanIndex {
  readonly prefixSum: Float64Array;
  readonly prefixCount: Float64Array;
  readonly times: readonly number[];
}

function fanIndex(times: readonly number[], fan: readonly (number | null)[]): FanIndex {
  const prefixSum = new Float64Array(fan.length + 1);
  const prefixCount = new Float64Array(fan.length + 1);
  for (let i = 0; i < fan.length; i += 1) {
    const v = fan[i];
    const has = v !== null && v !== undefined;
    prefixSum[i + 1] = (prefixSum[i] ?? 0) + (has ? v : 0);
    prefixCount[i + 1] = (prefixCount[i] ?? 0) + (has ? 1 : 0);
  }
  return { prefixSum, prefixCount, times };
}

function firstAtOrAfter(times: readonly number[], t: number): number {
  let lo = 0;
  let hi = times.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if ((times[mid] ?? 0) < t) {
      lo = mid + 1;
    } else {
      hi = mid;
    }
  }
  return lo;
}

function fanMean(index: FanIndex, from: number, to: number): { sum: number; count: number } {
  const a = firstAtOrAfter(index.times, from);
  const b = firstAtOrAfter(index.times, to);
  return {
    sum: (index.prefixSum[b] ?? 0) - (index.prefixSum[a] ?? 0),
    count: (index.prefixCount[b] ?? 0) - (index.prefixCount[a] ?? 0),
  };
}

function fanFollows(
  run: readonly TurningPoint[],
  grid: UniformGrid,
  fan: { index: FanIndex; values: readonly (number | null)[] } | null,
): boolean | null {
  if (fan === null) {
    return null;
  }
  const timeOf = (p: TurningPoint): number => grid.start + p.index * grid.step;
  const falling = { sum: 0, count: 0 };
  const rising = { sum: 0, count: 0 };
  for (let k = 1; k < run.length; k += 1) {
    const a = run[k - 1] as TurningPoint;
    const b = run[k] as TurningPoint;
    const part = fanMean(fan.index, timeOf(a), timeOf(b));
    const into = a.kind === 'peak' ? falling : rising;
    into.sum += part.sum;
    into.count += part.count;
  }
  if (falling.count === 0 || rising.count === 0) {
    return null;
  }
  const from = firstAtOrAfter(fan.index.times, timeOf(run[0] as TurningPoint));
  const to = firstAtOrAfter(fan.index.times, timeOf(run[run.length - 1] as TurningPoint));
  let low = Number.POSITIVE_INFINITY;
  let high = Number.NEGATIVE_INFINITY;
  for (let i = from; i < to; i += 1) {
    const v = fan.values[i];
    if (v !== null && v !== undefined) {
      low = Math.min(low, v);
      high = Math.max(high, v);
    }
  }
  const range = high - low;
  if (!(range > 0)) {
    return false;
  }
  return falling.sum / falling.count - rising.sum / rising.count >= FAN_FOLLOW_SHARE * range;
}

const NOTES: Readonly<Record<SwingSuggestion, string>> = {
  'fan-cycling':
    'The fan runs harder while the coolant falls: this looks like the fan cycling. Compare the swing with the fan’s switch points; within about 90–105 °C it is normal running (common practice).',
  'thermostat-hunting':
    'The swings do not follow the fan: this points at the thermostat hunting (opening and closing), or at air in the circuit.',
  'fan-or-thermostat':
    'The log has no fan channel, so the swings could be the fan cycling or the thermostat hunting; log the fan command to tell them apart.',
};

export function findSwings(
  grid: UniformGrid,
  fromSeconds: number,
  o: ResolvedAnalysisOptions,
  fanChannel: { times: readonly number[]; values: readonly (number | null)[] } | null,
): SwingResult {
  const s = movingAverage(grid.values, halfWidthFor(o.swingSmoothingSeconds, grid.step));
  const from = Math.max(
    0,
    Math.min(s.length - 1, Math.round((fromSeconds - grid.start) / grid.step)),
  );
  const points = turningPoints(s, from, o.minSwingK);
  const fan =
    fanChannel === null || fanChannel.values.every((v) => v === null)
      ? null
      : { index: fanIndex(fanChannel.times, fanChannel.values), values: fanChannel.values };
  const episodes: SwingEpisode[] = [];
  for (const run of stretches(points, grid.step, o.maxSwingPeriodSeconds / 2)) {
    const cycles = Math.floor((run.length - 1) / 2);
    if (cycles < o.minSwingCycles) {
      continue;
    }
    const amplitudes = run.slice(1).map((p, k) => Math.abs(p.value - (run[k]?.value ?? p.value)));
    const periods = run.slice(2).map((p, k) => (p.index - (run[k]?.index ?? p.index)) * grid.step);
    const first = run[0] as TurningPoint;
    const last = run[run.length - 1] as TurningPoint;
    let sum = 0;
    let minC = Number.POSITIVE_INFINITY;
    let maxC = Number.NEGATIVE_INFINITY;
    for (let i = first.index; i <= last.index; i += 1) {
      const v = grid.values[i] ?? 0;
      sum += v;
      minC = Math.min(minC, v);
      maxC = Math.max(maxC, v);
    }
    const follows = fanFollows(run, grid, fan);
    const suggestion: SwingSuggestion =
      follows === null ? 'fan-or-thermostat' : follows ? 'fan-cycling' : 'thermostat-hunting';
    episodes.push({
      startSeconds: grid.start + first.index * grid.step,
      endSeconds: grid.start + last.index * grid.step,
      cycles,
      amplitudeK: median(amplitudes),
      periodSeconds: median(periods),
      meanC: sum / (last.index - first.index + 1),
      minC,
      maxC,
      fanFollows: follows,
      suggestion,
      note: NOTES[suggestion],
    });
  }
  return {
    episodes,
    basis: {
      method: `Turning points of the coolant temperature (${o.swingSmoothingSeconds} s moving average) that reverse by at least ${o.minSwingK} K, grouped into stretches of regular swinging with periods up to ${o.maxSwingPeriodSeconds} s; a stretch of ${o.minSwingCycles} or more full cycles is reported with its median peak-to-trough swing and median period. With a fan channel, the fan running harder on the falls is read as fan cycling.`,
      status: `Heatpath’s method; the ${o.minSwingK} K smallest swing and ${o.minSwingCycles} cycles are Heatpath’s choices, not published figures. It suggests a cause; it does not prove one.`,
    },
  };
}
