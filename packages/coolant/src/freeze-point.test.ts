// Freezing points checked against the handbook tables as printed in trade-facts.md, typed in here
// again so a slip in glycol-tables.ts cannot make the test agree with itself.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { convertBasis } from './concentration-basis.js';
import { freezePoint } from './freeze-point.js';

// Source A: ASHRAE Handbook—Fundamentals, table of aqueous ethylene glycol properties
// (edition not verified), as given in trade-facts.md: [mass %, vol %, freezing point °C].
const ASHRAE_EG: readonly (readonly [number, number, number])[] = [
  [0, 0, 0.0],
  [10, 8.9, -3.2],
  [20, 18.1, -7.8],
  [25, 22.9, -10.7],
  [30, 27.7, -14.1],
  [35, 32.6, -17.9],
  [40, 37.5, -22.3],
  [45, 42.5, -27.5],
  [50, 47.6, -33.8],
  [55, 52.7, -41.1],
  [60, 57.8, -48.3],
];

// Source A (ASHRAE, as above), propylene glycol.
const ASHRAE_PG: readonly (readonly [number, number, number])[] = [
  [10, 9.6, -3.3],
  [20, 19.4, -7.1],
  [30, 29.4, -12.7],
  [40, 39.6, -21.1],
  [50, 49.9, -33.5],
  [60, 60.0, -51.1],
];

// trade-facts.md: ±0.3 K when checking an implementation against the same source's table.
const SAME_SOURCE_K = 0.3;

describe('freezePoint — ethylene glycol, Source A: ASHRAE Handbook—Fundamentals (±0.3 K)', () => {
  it.each(ASHRAE_EG)('%d mass %% (%d vol %%) freezes at %d °C', (mass, vol, celsius) => {
    const byMass = freezePoint({ glycol: 'ethylene', percent: mass, basis: 'mass' });
    const byVolume = freezePoint({ glycol: 'ethylene', percent: vol, basis: 'volume' });
    expect(byMass.celsius).not.toBeNull();
    expect(Math.abs((byMass.celsius ?? NaN) - celsius)).toBeLessThanOrEqual(SAME_SOURCE_K);
    expect(Math.abs((byVolume.celsius ?? NaN) - celsius)).toBeLessThanOrEqual(SAME_SOURCE_K);
  });

  it('50 vol % is about −37.0 °C (trade-facts.md: the ASHRAE table interpolated to 50 vol %)', () => {
    const r = freezePoint({ glycol: 'ethylene', percent: 50, basis: 'volume' });
    expect(Math.abs((r.celsius ?? NaN) - -37.0)).toBeLessThanOrEqual(SAME_SOURCE_K);
  });

  it('50 vol % meets the ASTM D3306 limit of −36.4 °C or lower (from memory, not confirmed)', () => {
    const r = freezePoint({ glycol: 'ethylene', percent: 50, basis: 'volume' });
    expect(r.celsius ?? NaN).toBeLessThanOrEqual(-36.4);
  });

  it('accepts "50 %" typed as a string', () => {
    expect(freezePoint({ glycol: 'ethylene', percent: '50 %', basis: 'mass' }).celsius).toBeCloseTo(
      -33.8,
      6,
    );
  });
});

describe('freezePoint — propylene glycol, Source A (ASHRAE, as above) (±0.3 K)', () => {
  it.each(ASHRAE_PG)('%d mass %% (%d vol %%) freezes at %d °C', (mass, vol, celsius) => {
    const byMass = freezePoint({ glycol: 'propylene', percent: mass, basis: 'mass' });
    const byVolume = freezePoint({ glycol: 'propylene', percent: vol, basis: 'volume' });
    expect(Math.abs((byMass.celsius ?? NaN) - celsius)).toBeLessThanOrEqual(SAME_SOURCE_K);
    expect(Math.abs((byVolume.celsius ?? NaN) - celsius)).toBeLessThanOrEqual(SAME_SOURCE_K);
  });
});

describe('freezePoint — past the table (trade-facts.md: above about 60 mass % published data disagree)', () => {
  it.each([
    ['ethylene', 61, 'mass'],
    ['ethylene', 80, 'mass'],
    ['ethylene', 58, 'volume'],
    ['ethylene', 100, 'volume'],
    ['propylene', 65, 'mass'],
    ['propylene', 60.5, 'volume'],
  ] as const)(
    '%s %d %s %% gives no figure and the over-concentrated warning',
    (glycol, percent, basis) => {
      const r = freezePoint({ glycol, percent, basis });
      expect(r.celsius).toBeNull();
      expect(r.warnings.map((w) => w.code)).toContain('over-concentrated');
      expect(r.warnings[0]?.message).toMatch(/over-concentrated, protection falls again/i);
      expect(r.warnings[0]?.message).toContain(
        glycol === 'ethylene' ? 'use 40–55 vol %' : 'use 40–60 vol %',
      );
    },
  );

  // Heatpath's judgement (recommended-concentration.ts): the cited EG table ends at 57.8 vol %,
  // so the advice for EG is 40–55 vol % and every advised mix has a figure.
  it.each([40, 45, 50, 55])(
    'ethylene glycol: every advised mix has a figure (%d vol %%)',
    (vol) => {
      const r = freezePoint({ glycol: 'ethylene', percent: vol, basis: 'volume' });
      expect(r.celsius).not.toBeNull();
      expect(r.warnings).toEqual([]);
    },
  );

  it('ethylene glycol at 56–57.8 vol % keeps its figure but is above the advised 40–55 vol %', () => {
    const r = freezePoint({ glycol: 'ethylene', percent: 57, basis: 'volume' });
    expect(r.celsius).not.toBeNull();
    expect(r.warnings.map((w) => w.code)).toEqual(['above-recommended-concentration']);
    expect(r.warnings[0]?.message).toContain('40–55 vol %');
  });

  it('propylene glycol: the whole ASTM D3306 range 40–60 vol % has a figure', () => {
    for (const vol of [40, 50, 60]) {
      const r = freezePoint({ glycol: 'propylene', percent: vol, basis: 'volume' });
      expect(r.celsius).not.toBeNull();
      expect(r.warnings).toEqual([]);
    }
  });

  it('warns below the advised 40 vol % (ASTM D3306) but still gives the figure', () => {
    const r = freezePoint({ glycol: 'ethylene', percent: 30, basis: 'volume' });
    expect(r.celsius).not.toBeNull();
    expect(r.warnings.map((w) => w.code)).toEqual(['below-recommended-concentration']);
  });
});

// ASHRAE's EG table in 1-mass-% steps, as reproduced in CoolProp's source data
// (dev/incompressible_liquids/CPIncomp/data/SecCool/xVolume/"ASHRAE, Ethylene Glycol_TFreeze.txt"):
// rows between the 5 % rows Heatpath stores, so they check the interpolation, not the stored rows.
// [vol %, freezing point °C]
const ASHRAE_EG_FINE: readonly (readonly [number, number])[] = [
  [22, -10.2],
  [30.6, -16.2],
  [36.5, -21.3],
  [40.5, -25.3],
  [45.5, -31.1],
  [49.6, -36.4],
  [50.6, -37.9],
  [54.7, -44.2],
  [56.8, -47.1],
];

describe('freezePoint — between the stored rows, against ASHRAE’s 1 % rows (CoolProp reproduction, ±0.3 K)', () => {
  it.each(ASHRAE_EG_FINE)('%d vol %% freezes at %d °C', (vol, celsius) => {
    const r = freezePoint({ glycol: 'ethylene', percent: vol, basis: 'volume' });
    expect(Math.abs((r.celsius ?? NaN) - celsius)).toBeLessThanOrEqual(SAME_SOURCE_K);
  });
});

describe('freezePoint — properties (fast-check)', () => {
  // The tables fall steadily from 0 to 60 mass %, so the interpolation must too.
  it.each(['ethylene', 'propylene'] as const)(
    '%s: colder as the mix gets richer, 0–60 mass %%',
    (glycol) => {
      fc.assert(
        fc.property(
          fc.double({ min: 0, max: 60, noNaN: true }),
          fc.double({ min: 0, max: 60, noNaN: true }),
          (a, b) => {
            fc.pre(a < b);
            const fa = freezePoint({ glycol, percent: a, basis: 'mass' }).celsius ?? NaN;
            const fb = freezePoint({ glycol, percent: b, basis: 'mass' }).celsius ?? NaN;
            return fb <= fa;
          },
        ),
      );
    },
  );

  it.each(['ethylene', 'propylene'] as const)(
    '%s: the same mix gives the same point on either basis',
    (glycol) => {
      fc.assert(
        fc.property(fc.double({ min: 0, max: 57.8, noNaN: true }), (vol) => {
          const mass = convertBasis({ glycol, percent: vol, from: 'volume', to: 'mass' }) ?? NaN;
          const a = freezePoint({ glycol, percent: vol, basis: 'volume' }).celsius ?? NaN;
          const b = freezePoint({ glycol, percent: mass, basis: 'mass' }).celsius ?? NaN;
          return Math.abs(a - b) < 1e-9;
        }),
      );
    },
  );

  it('the interpolation never leaves the band between neighbouring table rows (no overshoot)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 60, noNaN: true }), (mass) => {
        const f = freezePoint({ glycol: 'ethylene', percent: mass, basis: 'mass' }).celsius ?? NaN;
        const i = ASHRAE_EG.findIndex(([m]) => m >= mass);
        const hi = ASHRAE_EG[Math.max(i - 1, 0)];
        const lo = ASHRAE_EG[i];
        if (hi === undefined || lo === undefined) return false;
        return f <= hi[2] + 1e-9 && f >= lo[2] - 1e-9;
      }),
    );
  });
});
