// The monotone interpolation checked against SciPy's PchipInterpolator (Debian python3-scipy,
// called through /usr/bin/python3), the reference implementation of the same scheme.
import { execFileSync } from 'node:child_process';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ETHYLENE_GLYCOL_FREEZE_TABLE, PROPYLENE_GLYCOL_FREEZE_TABLE } from './glycol-tables.js';
import { createMonotoneInterpolator, invertMonotone } from './monotone-interpolation.js';

function scipyAvailable(): boolean {
  try {
    execFileSync('/usr/bin/python3', ['-c', 'from scipy.interpolate import PchipInterpolator'], {
      stdio: 'ignore',
    });
    return true;
  } catch {
    return false;
  }
}
const HAVE_SCIPY = scipyAvailable();
const SKIP_NOTE =
  'SKIPPED: SciPy (Debian python3-scipy) is not importable by /usr/bin/python3; install it to compare against PchipInterpolator';
if (!HAVE_SCIPY) {
  console.warn(SKIP_NOTE);
}

function scipyPchip(xs: readonly number[], ys: readonly number[], at: readonly number[]): number[] {
  const script = [
    'import json, sys',
    'from scipy.interpolate import PchipInterpolator',
    'xs, ys, at = json.loads(sys.argv[1])',
    'print(json.dumps([float(v) for v in PchipInterpolator(xs, ys)(at)]))',
  ].join('\n');
  const out = execFileSync('/usr/bin/python3', ['-c', script, JSON.stringify([xs, ys, at])], {
    encoding: 'utf8',
  });
  return JSON.parse(out) as number[];
}

describe('createMonotoneInterpolator — against SciPy PchipInterpolator', () => {
  const cases = [
    ['ethylene glycol freezing point by mass %', ETHYLENE_GLYCOL_FREEZE_TABLE],
    ['propylene glycol freezing point by mass %', PROPYLENE_GLYCOL_FREEZE_TABLE],
  ] as const;
  it.skipIf(!HAVE_SCIPY).each(cases)(
    HAVE_SCIPY ? '%s agrees to 1e-9' : `${SKIP_NOTE} (%s)`,
    (_name, table) => {
      const xs = table.map((r) => r.massPercent);
      const ys = table.map((r) => r.freezeCelsius);
      const at = Array.from({ length: 121 }, (_, i) => i / 2);
      const expected = scipyPchip(xs, ys, at);
      const f = createMonotoneInterpolator(xs, ys);
      at.forEach((x, i) => {
        expect(Math.abs(f(x) - (expected[i] ?? NaN)), `at ${x}`).toBeLessThan(1e-9);
      });
    },
  );
});

describe('createMonotoneInterpolator — behaviour', () => {
  it('passes through the points and refuses to extrapolate', () => {
    const f = createMonotoneInterpolator([0, 1, 3], [0, 2, 3]);
    expect(f(1)).toBe(2);
    expect(() => f(3.5)).toThrow(RangeError);
    expect(() => f(NaN)).toThrow(RangeError);
  });

  it('stays flat across a flat stretch of data (no overshoot)', () => {
    const f = createMonotoneInterpolator([0, 1, 2, 3], [0, 1, 1, 2]);
    fc.assert(
      fc.property(fc.double({ min: 1, max: 2, noNaN: true }), (x) => Math.abs(f(x) - 1) < 1e-12),
    );
  });

  it('inverts exactly at the ends and to 1e-9 inside', () => {
    const f = createMonotoneInterpolator([0, 10, 20], [0, -3, -8]);
    expect(invertMonotone(f, 0)).toBe(0);
    expect(invertMonotone(f, -8)).toBe(20);
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 20, noNaN: true }),
        (x) => Math.abs(invertMonotone(f, f(x)) - x) < 1e-9,
      ),
    );
  });
});
