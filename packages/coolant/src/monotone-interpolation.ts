// Piecewise cubic Hermite interpolation with Fritsch–Carlson style slope limiting (the PCHIP
// scheme): it passes through every table point and never overshoots between them, so a handbook
// table that falls steadily gives a curve that falls steadily too — linear interpolation would do
// that as well but with kinks, and a plain cubic spline can wiggle past the data.
import { at } from './table-access.js';

export interface MonotoneInterpolator {
  /** Interpolated value; throws RangeError outside the table's x range. */
  (x: number): number;
  readonly xMin: number;
  readonly xMax: number;
}

function sign(v: number): number {
  return v > 0 ? 1 : v < 0 ? -1 : 0;
}

/** Slopes at the end points: the three-point formula, limited so the end segment stays monotone. */
function endSlope(h0: number, h1: number, d0: number, d1: number): number {
  const m = ((2 * h0 + h1) * d0 - h0 * d1) / (h0 + h1);
  if (sign(m) !== sign(d0)) {
    return 0;
  }
  if (sign(d0) !== sign(d1) && Math.abs(m) > Math.abs(3 * d0)) {
    return 3 * d0;
  }
  return m;
}

function slopes(xs: readonly number[], ys: readonly number[]): number[] {
  const n = xs.length;
  const h: number[] = [];
  const d: number[] = [];
  for (let i = 0; i < n - 1; i++) {
    const dx = at(xs, i + 1) - at(xs, i);
    h.push(dx);
    d.push((at(ys, i + 1) - at(ys, i)) / dx);
  }
  if (n === 2) {
    return [at(d, 0), at(d, 0)];
  }
  const m: number[] = new Array<number>(n).fill(0);
  for (let k = 1; k < n - 1; k++) {
    const dPrev = at(d, k - 1);
    const dNext = at(d, k);
    if (sign(dPrev) * sign(dNext) <= 0) {
      m[k] = 0; // a local extremum in the data: a flat slope keeps the curve from overshooting it
    } else {
      // Weighted harmonic mean of the neighbouring secants (Fritsch–Butland weights).
      const w1 = 2 * at(h, k) + at(h, k - 1);
      const w2 = at(h, k) + 2 * at(h, k - 1);
      m[k] = (w1 + w2) / (w1 / dPrev + w2 / dNext);
    }
  }
  m[0] = endSlope(at(h, 0), at(h, 1), at(d, 0), at(d, 1));
  m[n - 1] = endSlope(at(h, n - 2), at(h, n - 3), at(d, n - 2), at(d, n - 3));
  return m;
}

/** Builds a monotone interpolator through the points (xs[i], ys[i]); xs must rise strictly. */
export function createMonotoneInterpolator(
  xs: readonly number[],
  ys: readonly number[],
): MonotoneInterpolator {
  if (xs.length !== ys.length || xs.length < 2) {
    throw new Error('Monotone interpolation needs two or more matching x and y values.');
  }
  for (let i = 1; i < xs.length; i++) {
    if (!(at(xs, i) > at(xs, i - 1))) {
      throw new Error('Monotone interpolation needs strictly rising x values.');
    }
  }
  const m = slopes(xs, ys);
  const xMin = at(xs, 0);
  const xMax = at(xs, xs.length - 1);

  const f = (x: number): number => {
    if (!(x >= xMin && x <= xMax)) {
      throw new RangeError(`x = ${x} is outside the table range ${xMin}…${xMax}.`);
    }
    let i = 0;
    while (i < xs.length - 2 && x > at(xs, i + 1)) {
      i++;
    }
    const x0 = at(xs, i);
    const h = at(xs, i + 1) - x0;
    const t = (x - x0) / h;
    const t2 = t * t;
    const t3 = t2 * t;
    return (
      (2 * t3 - 3 * t2 + 1) * at(ys, i) +
      (t3 - 2 * t2 + t) * h * at(m, i) +
      (-2 * t3 + 3 * t2) * at(ys, i + 1) +
      (t3 - t2) * h * at(m, i + 1)
    );
  };
  return Object.assign(f, { xMin, xMax });
}

/**
 * Solves f(x) = y for a monotone interpolator by bisection. Bisection is slow but cannot miss on a
 * monotone curve, and the tables here are small.
 */
export function invertMonotone(f: MonotoneInterpolator, y: number): number {
  let lo = f.xMin;
  let hi = f.xMax;
  if (y === f(lo)) {
    return lo;
  }
  if (y === f(hi)) {
    return hi;
  }
  const rising = f(hi) >= f(lo);
  for (let i = 0; i < 200 && hi - lo > 1e-12; i++) {
    const mid = (lo + hi) / 2;
    const below = f(mid) < y;
    if (below === rising) {
      lo = mid;
    } else {
      hi = mid;
    }
  }
  return (lo + hi) / 2;
}
