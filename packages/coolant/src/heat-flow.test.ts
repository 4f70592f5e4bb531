// Heat flow Q = ṁ·cp·ΔT checked against kW worked by hand from published property figures:
// Source A in trade-facts.md (ASHRAE Handbook—Fundamentals, 50 vol % EG; 40/60 vol % at 85 °C),
// ASHRAE's propylene glycol table as reproduced in CoolProp's incompressible-liquid source data
// ("ASHRAE, Propylene Glycol_Rho.txt" / "…_Cp.txt"), and water from IAPWS-IF97 (trade-facts.md at
// 85 °C; the iapws Python library elsewhere, skipped with a message when absent). ±1 %, the
// spread trade-facts.md allows between sources.
import { describe, expect, it } from 'vitest';
import { CoolantInputError } from './errors.js';
import { heatFlow } from './heat-flow.js';
import type { HeatFlowOptions } from './heat-flow.js';
import { HAVE_IAPWS, IAPWS_SKIP_NOTE, iapwsWater } from './test-support/python-reference.js';

function withinOnePercent(actual: number, expected: number): void {
  expect(Math.abs(actual - expected) / Math.abs(expected)).toBeLessThanOrEqual(0.01);
}

/** kW from litres per minute, density kg/m³, cp J/(kg·K) and ΔT K. */
function byHand(lpm: number, density: number, cp: number, dT: number): number {
  return ((lpm / 60_000) * density * cp * dT) / 1000;
}

const base: HeatFlowOptions = {
  glycol: 'ethylene',
  percent: 50,
  basis: 'volume',
  litresPerMinute: 40,
  inletCelsius: 88,
  outletCelsius: 82,
};

describe('heatFlow — Source A: ASHRAE Handbook—Fundamentals, EG density and cp (±1 %)', () => {
  it.each([
    // [inlet, outlet, density at mean, cp at mean] from trade-facts.md's 50 vol % rows
    [83, 77, 1038.5, 3512],
    [88, 82, 1034.8, 3532],
    [93, 87, 1031.0, 3551],
  ])('in %d °C, out %d °C at 40 L/min', (inlet, outlet, density, cp) => {
    const r = heatFlow({ ...base, inletCelsius: inlet, outletCelsius: outlet });
    withinOnePercent(r.kilowatts, byHand(40, density, cp, inlet - outlet));
    expect(r.warnings).toEqual([]);
  });

  it.each([
    // Source A at 85 °C: 40 vol % → 1023.1 kg/m³, 3686 J/(kg·K); 60 vol % → 1045.6, 3367
    [40, 1023.1, 3686],
    [60, 1045.6, 3367],
  ])('%d vol %% at 85 °C mean', (percent, density, cp) => {
    const r = heatFlow({
      ...base,
      percent,
      litresPerMinute: 25,
      inletCelsius: 90,
      outletCelsius: 80,
    });
    withinOnePercent(r.kilowatts, byHand(25, density, cp, 10));
  });

  it('EG 30 vol % at a 60 °C mean (a warm-up or low-temperature loop) — ASHRAE via CoolProp: 1026.36 kg/m³, 3759 J/(kg·K)', () => {
    const r = heatFlow({ ...base, percent: 30, inletCelsius: 63, outletCelsius: 57 });
    withinOnePercent(r.kilowatts, byHand(40, 1026.36, 3759, 6));
  });

  it('reads typed units: 10 gal/min, 195 degF in, 185 degF out', () => {
    const r = heatFlow({
      ...base,
      litresPerMinute: '10 gal/min',
      inletCelsius: '195 degF',
      outletCelsius: '185 degF',
    });
    // 10 US gal/min = 37.854 L/min; mean 87.8 °C lies between the 85 and 90 °C rows.
    const density = 1034.8 + ((1031.0 - 1034.8) * (r.meanCelsius - 85)) / 5;
    const cp = 3532 + ((3551 - 3532) * (r.meanCelsius - 85)) / 5;
    withinOnePercent(r.kilowatts, byHand(37.854, density, cp, 50 / 9));
  });
});

describe('heatFlow — propylene glycol, ASHRAE table as reproduced in CoolProp (±1 %)', () => {
  it.each([
    // [vol %, inlet, outlet, density at mean, cp at mean]
    [30, 103, 97, 976.36, 4068],
    [40, 88, 82, 993.17, 3916],
    [50, 63, 57, 1017.04, 3686],
    [60, 88, 82, 999.28, 3625],
  ])('%d vol %%, in %d °C, out %d °C at 40 L/min', (percent, inlet, outlet, density, cp) => {
    const r = heatFlow({
      ...base,
      glycol: 'propylene',
      percent,
      inletCelsius: inlet,
      outletCelsius: outlet,
    });
    withinOnePercent(r.kilowatts, byHand(40, density, cp, inlet - outlet));
  });

  it('takes mass % through the table’s own columns: 50 mass % PG is 49.9 vol %', () => {
    const r = heatFlow({ ...base, glycol: 'propylene', basis: 'mass' });
    expect(r.volumePercent).toBeCloseTo(49.9, 6);
    // ASHRAE 50 vol % PG at 85 °C: 996.73 kg/m³, 3783 J/(kg·K).
    withinOnePercent(r.kilowatts, byHand(40, 996.73, 3783, 6));
  });
});

describe('heatFlow — 60–120 °C, the range engines run at', () => {
  it('a 115 °C mean (radiator inlet 118 °C under the cap) is worked out and flagged as beyond the 100 °C table', () => {
    const r = heatFlow({ ...base, inletCelsius: 118, outletCelsius: 112 });
    // The line through ASHRAE's 50 vol % EG 95 and 100 °C rows, carried to 115 °C.
    const density = 1022.95 + 3 * (1022.95 - 1027.01);
    const cp = 3590 + 3 * (3590 - 3570);
    withinOnePercent(r.kilowatts, byHand(40, density, cp, 6));
    expect(r.warnings.map((w) => w.code)).toEqual(['properties-extrapolated']);
  });

  it('water at 85 °C mean — IAPWS-IF97 (85 °C, 0.2 MPa, trade-facts.md): 968.67 kg/m³, 4199.8 J/(kg·K)', () => {
    const r = heatFlow({ ...base, percent: 0, litresPerMinute: 30 });
    withinOnePercent(r.kilowatts, byHand(30, 968.67, 4199.8, 6));
    expect(r.warnings).toEqual([]);
  });

  it.skipIf(!HAVE_IAPWS)(
    HAVE_IAPWS
      ? 'water at 60, 100 and 120 °C means within 1 % of iapws (IAPWS97 at 0.3 MPa)'
      : IAPWS_SKIP_NOTE,
    () => {
      const means = [60, 100, 120];
      const reference = iapwsWater(means, 0.3);
      means.forEach((mean, i) => {
        const [density, cp] = reference[i] ?? [NaN, NaN];
        const r = heatFlow({
          ...base,
          glycol: 'propylene',
          percent: 0,
          basis: 'mass',
          litresPerMinute: 30,
          inletCelsius: mean + 3,
          outletCelsius: mean - 3,
        });
        withinOnePercent(r.kilowatts, byHand(30, density, cp, 6));
      });
    },
  );
});

describe('heatFlow — refuses what cannot be, naming the box', () => {
  const refusedOn = (options: Partial<HeatFlowOptions>, field: string, text?: RegExp): void => {
    try {
      heatFlow({ ...base, ...options });
      expect.fail('expected a CoolantInputError');
    } catch (error) {
      expect(error).toBeInstanceOf(CoolantInputError);
      expect((error as CoolantInputError).field).toBe(field);
      if (text) expect((error as Error).message).toMatch(text);
    }
  };

  it('1,000,000 L/min: beyond any vehicle coolant pump (common practice: a car’s moves roughly 50–250 L/min)', () => {
    refusedOn({ litresPerMinute: 1_000_000 }, 'litresPerMinute', /more than any vehicle/);
    refusedOn({ litresPerMinute: '500 gal/min' }, 'litresPerMinute');
  });

  it('a reading hotter than liquid coolant gets, or colder than the mix’s freezing point', () => {
    refusedOn({ inletCelsius: 200 }, 'inletCelsius', /not a liquid coolant temperature/);
    // Water freezes at 0 °C; 50 vol % EG near −37 °C (ASHRAE, trade-facts.md).
    refusedOn({ percent: 0, outletCelsius: -5, inletCelsius: 10 }, 'outletCelsius', /freezes/);
    refusedOn({ outletCelsius: -45, inletCelsius: 60 }, 'outletCelsius', /freezes at about −?-?37/);
  });

  it('a mean outside 0–120 °C, or a mix richer than the tables', () => {
    refusedOn({ inletCelsius: 130, outletCelsius: 124 }, 'inletCelsius', /0–120 °C/);
    refusedOn({ percent: 65 }, 'percent');
    refusedOn({ glycol: 'propylene', percent: 70, basis: 'mass' }, 'percent');
  });
});
