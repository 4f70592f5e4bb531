// The property tables and their interpolation, checked against sources outside the project:
// - ASHRAE Handbook—Fundamentals glycol density/cp tables as reproduced in CoolProp's
//   incompressible-liquid source data (dev/incompressible_liquids/CPIncomp/data/SecCool/xVolume/
//   "ASHRAE, Ethylene Glycol_Rho.txt", "…_Cp.txt", "ASHRAE, Propylene Glycol_Rho.txt", "…_Cp.txt"):
//   cells typed again here from those files;
// - trade-facts.md's Source A figures (ASHRAE, 50 vol % EG at 80/85/90 °C; 40 and 60 vol % at 85 °C);
// - IAPWS-IF97 for water, through the iapws Python library (python3-iapws) when it is installed,
//   and trade-facts.md's IAPWS-IF97 figure at 85 °C always.
import { describe, expect, it } from 'vitest';
import { coolantProperties } from './coolant-properties.js';
import { CoolantInputError } from './errors.js';
import {
  ETHYLENE_GLYCOL_PROPERTIES,
  PROPYLENE_GLYCOL_PROPERTIES,
  WATER_PROPERTIES,
} from './property-tables.js';
import type { PropertyGrid } from './property-tables.js';
import { HAVE_IAPWS, IAPWS_SKIP_NOTE, iapwsWater } from './test-support/python-reference.js';

if (!HAVE_IAPWS) console.warn(IAPWS_SKIP_NOTE);

function relative(actual: number, expected: number): number {
  return Math.abs(actual - expected) / Math.abs(expected);
}

describe('glycol properties — ASHRAE cells typed again from CoolProp’s reproduction (exact at rows)', () => {
  it.each([
    // [glycol, vol %, °C, density kg/m³, cp J/(kg·K)]
    ['ethylene', 30, 60, 1026.36, 3759],
    ['ethylene', 60, 0, 1094.64, 2997],
    ['ethylene', 10, 100, 972.32, 4112],
    ['ethylene', 40, 70, 1033.37, 3636],
    ['propylene', 30, 85, 988.6, 4027],
    ['propylene', 40, 60, 1012.3, 3834],
    ['propylene', 50, 100, 983, 3841],
    ['propylene', 60, 100, 984.94, 3692],
    ['propylene', 60, 20, 1048.25, 3339],
  ] as const)('%s %d vol %% at %d °C', (glycol, percent, celsius, density, cp) => {
    const p = coolantProperties(glycol, percent, celsius);
    expect(p.density).toBeCloseTo(density, 6);
    expect(p.cp).toBeCloseTo(cp, 6);
    expect(p.warnings).toEqual([]);
  });

  it.each([
    // trade-facts.md, Source A (ASHRAE): 50 vol % EG; 40 and 60 vol % at 85 °C. Its figures are
    // rounded to 0.1 kg/m³, hence ±0.05.
    [50, 80, 1038.5, 3512],
    [50, 85, 1034.8, 3532],
    [50, 90, 1031.0, 3551],
    [40, 85, 1023.1, 3686],
    [60, 85, 1045.6, 3367],
  ])(
    'EG %d vol %% at %d °C agrees with trade-facts.md Source A',
    (percent, celsius, density, cp) => {
      const p = coolantProperties('ethylene', percent, celsius);
      expect(Math.abs(p.density - density)).toBeLessThanOrEqual(0.05);
      expect(p.cp).toBe(cp);
    },
  );

  it('interpolates linearly between rows and columns (PG 45 vol % at 72.5 °C, worked by hand from the four ASHRAE cells)', () => {
    // 70 °C: 40 % 1005.03 / 3867, 50 % 1009.3 / 3725; 75 °C: 40 % 1001.21 / 3883, 50 % 1005.24 / 3744.
    const density = (1005.03 + 1009.3 + 1001.21 + 1005.24) / 4;
    const cp = (3867 + 3725 + 3883 + 3744) / 4;
    const p = coolantProperties('propylene', 45, 72.5);
    expect(p.density).toBeCloseTo(density, 9);
    expect(p.cp).toBeCloseTo(cp, 9);
  });
});

describe('above the tables’ 100 °C — a straight line from the last 5 K, with a warning', () => {
  const grids: [string, PropertyGrid][] = [
    ['ethylene', ETHYLENE_GLYCOL_PROPERTIES],
    ['propylene', PROPYLENE_GLYCOL_PROPERTIES],
  ];

  it.each(grids)(
    '%s: the same line carried 20 K on the table itself (75–80 °C rows → 100 °C) stays within 0.15 % of the printed 100 °C row',
    (_name, grid) => {
      const row = (c: number): number => grid.celsius.indexOf(c);
      for (const table of [grid.density, grid.cp]) {
        grid.volumePercents.forEach((_v, col) => {
          const at75 = table[row(75)]?.[col] ?? NaN;
          const at80 = table[row(80)]?.[col] ?? NaN;
          const at100 = table[row(100)]?.[col] ?? NaN;
          const predicted = at80 + ((at80 - at75) / 5) * 20;
          expect(relative(predicted, at100)).toBeLessThanOrEqual(0.0015);
        });
      }
    },
  );

  it('EG 50 vol % at 110 °C: the line through the 95 and 100 °C rows, flagged as extrapolated', () => {
    const p = coolantProperties('ethylene', 50, 110);
    // ASHRAE 50 vol %: 95 °C 1027.01 / 3570; 100 °C 1022.95 / 3590.
    expect(p.density).toBeCloseTo(1022.95 + 2 * (1022.95 - 1027.01), 9);
    expect(p.cp).toBeCloseTo(3590 + 2 * (3590 - 3570), 9);
    expect(p.warnings.map((w) => w.code)).toEqual(['properties-extrapolated']);
  });
});

describe('water — IAPWS-IF97', () => {
  it('85 °C matches trade-facts.md (IAPWS-IF97 at 85 °C, 0.2 MPa: 968.67 kg/m³, 4199.8 J/(kg·K)) within 0.01 %', () => {
    // The table is at 0.3 MPa; 0.1 MPa more moves liquid water's density by about 0.005 %.
    const p = coolantProperties('ethylene', 0, 85);
    expect(relative(p.density, 968.67)).toBeLessThanOrEqual(0.0001);
    expect(relative(p.cp, 4199.8)).toBeLessThanOrEqual(0.0001);
  });

  it.skipIf(!HAVE_IAPWS)(
    HAVE_IAPWS
      ? 'every table row and the points between them agree with iapws (IAPWS97 at 0.3 MPa) within 0.05 %'
      : IAPWS_SKIP_NOTE,
    () => {
      const celsius = [...WATER_PROPERTIES.celsius, 62.5, 87.5, 117.5];
      const reference = iapwsWater(celsius, 0.3);
      celsius.forEach((c, i) => {
        const [density, cp] = reference[i] ?? [NaN, NaN];
        const p = coolantProperties('propylene', 0, c);
        expect(relative(p.density, density), `density at ${c} °C`).toBeLessThanOrEqual(0.0005);
        expect(relative(p.cp, cp), `cp at ${c} °C`).toBeLessThanOrEqual(0.0005);
      });
    },
  );
});

describe('refusals — no cited figure', () => {
  it('refuses a mean temperature outside 0–120 °C and a mix over 60 vol %', () => {
    expect(() => coolantProperties('ethylene', 50, 121)).toThrow(CoolantInputError);
    expect(() => coolantProperties('ethylene', 50, -1)).toThrow(CoolantInputError);
    expect(() => coolantProperties('propylene', 61, 85)).toThrow(/stop at 60 vol %/);
  });
});
