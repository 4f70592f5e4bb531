// Puts a log on an even time step, because loggers sample unevenly (and drop readings), and
// moving averages and rates over a fixed number of seconds need evenly spaced points. Values
// between readings are linearly interpolated; the step is the log's typical interval.

export interface UniformGrid {
  /** Time of the first point, s. */
  readonly start: number;
  /** Seconds between grid points. */
  readonly step: number;
  readonly values: Float64Array;
}

// Keeps the grid, and so the analysis time, bounded for very long or very finely sampled logs.
const MAX_POINTS = 500_000;
const MIN_STEP = 0.05;

/** The median gap between readings that are not at the same time. */
export function medianInterval(times: readonly number[]): number {
  const gaps: number[] = [];
  for (let i = 1; i < times.length; i += 1) {
    const gap = (times[i] ?? 0) - (times[i - 1] ?? 0);
    if (gap > 0) {
      gaps.push(gap);
    }
  }
  if (gaps.length === 0) {
    return 0;
  }
  gaps.sort((a, b) => a - b);
  return gaps[Math.floor(gaps.length / 2)] ?? 0;
}

export function uniformGrid(times: readonly number[], values: readonly number[]): UniformGrid {
  const duration = (times[times.length - 1] ?? 0) - (times[0] ?? 0);
  const step = Math.max(medianInterval(times), MIN_STEP, duration / (MAX_POINTS - 1));
  const count = Math.floor(duration / step) + 1;
  const out = new Float64Array(count);
  const t0 = times[0] ?? 0;
  let j = 0;
  for (let k = 0; k < count; k += 1) {
    const t = t0 + k * step;
    while (j < times.length - 2 && (times[j + 1] ?? 0) <= t) {
      j += 1;
    }
    const ta = times[j] ?? 0;
    const tb = times[j + 1] ?? ta;
    const va = values[j] ?? 0;
    const vb = values[j + 1] ?? va;
    const f = tb > ta ? Math.min(1, Math.max(0, (t - ta) / (tb - ta))) : 1;
    out[k] = va + (vb - va) * f;
  }
  return { start: t0, step, values: out };
}

/**
 * Centred moving average over `halfWidth` points each side. Near the ends, where the window is
 * cut short, a straight line fitted over the points there is used instead: a plain average of a
 * one-sided window would lag a rising log's first minute by half the window.
 */
export function movingAverage(values: Float64Array, halfWidth: number): Float64Array {
  const n = values.length;
  // Prefix sums of x and of k·x; sums of k and k² have closed forms.
  const sx = new Float64Array(n + 1);
  const skx = new Float64Array(n + 1);
  for (let k = 0; k < n; k += 1) {
    const x = values[k] ?? 0;
    sx[k + 1] = (sx[k] ?? 0) + x;
    skx[k + 1] = (skx[k] ?? 0) + k * x;
  }
  const sumK = (a: number, b: number): number => ((a + b) * (b - a + 1)) / 2;
  const sumKK = (a: number, b: number): number => {
    const upTo = (m: number): number => (m * (m + 1) * (2 * m + 1)) / 6;
    return upTo(b) - (a > 0 ? upTo(a - 1) : 0);
  };
  const out = new Float64Array(n);
  for (let i = 0; i < n; i += 1) {
    const a = Math.max(0, i - halfWidth);
    const b = Math.min(n - 1, i + halfWidth);
    const m = b - a + 1;
    const meanX = ((sx[b + 1] ?? 0) - (sx[a] ?? 0)) / m;
    if (i - a === b - i || m < 3) {
      out[i] = meanX;
      continue;
    }
    const k1 = sumK(a, b);
    const k2 = sumKK(a, b);
    const kx = (skx[b + 1] ?? 0) - (skx[a] ?? 0);
    const slope = (m * kx - k1 * (meanX * m)) / (m * k2 - k1 * k1);
    out[i] = meanX + slope * (i - k1 / m);
  }
  return out;
}

/** Points each side for a window of `seconds` on a grid of `step`. */
export function halfWidthFor(seconds: number, step: number): number {
  return Math.max(0, Math.round(seconds / (2 * step)));
}
