// Heat flow Q = ṁ·cp·ΔT checked against figures worked by hand from the density and specific-heat
// table in trade-facts.md (Source A, ASHRAE; water from IAPWS-IF97), ±1 %.
import { execFileSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { CoolantInputError } from './errors.js';
import { heatFlow } from './heat-flow.js';

function withinOnePercent(actual: number, expected: number): void {
  expect(Math.abs(actual - expected) / Math.abs(expected)).toBeLessThanOrEqual(0.01);
}

/** kW from litres per minute, density kg/m³, cp J/(kg·K) and ΔT K. */
function byHand(lpm: number, density: number, cp: number, dT: number): number {
  return ((lpm / 60_000) * density * cp * dT) / 1000;
}

describe('heatFlow — Source A: ASHRAE Handbook—Fundamentals, 50 vol % EG density and cp (±1 %)', () => {
  it.each([
    // [inlet, outlet, density at mean, cp at mean] from the 50 vol % rows
    [83, 77, 1038.5, 3512],
    [88, 82, 1034.8, 3532],
    [93, 87, 1031.0, 3551],
  ])('in %d °C, out %d °C at 40 L/min', (inlet, outlet, density, cp) => {
    const r = heatFlow({
      glycol: 'ethylene',
      percent: 50,
      basis: 'volume',
      litresPerMinute: 40,
      inletCelsius: inlet,
      outletCelsius: outlet,
    });
    withinOnePercent(r.kilowatts, byHand(40, density, cp, inlet - outlet));
    expect(r.warnings).toEqual([]);
  });

  it.each([
    // Source A at 85 °C: 40 vol % → 1023.1 kg/m³, 3686 J/(kg·K); 60 vol % → 1045.6, 3367
    [40, 1023.1, 3686],
    [60, 1045.6, 3367],
  ])('%d vol %% at 85 °C mean', (percent, density, cp) => {
    const r = heatFlow({
      glycol: 'ethylene',
      percent,
      basis: 'volume',
      litresPerMinute: 25,
      inletCelsius: 90,
      outletCelsius: 80,
    });
    withinOnePercent(r.kilowatts, byHand(25, density, cp, 10));
  });

  it('water at 85 °C mean — IAPWS-IF97 (85 °C, 0.2 MPa): 968.67 kg/m³, 4199.8 J/(kg·K)', () => {
    const r = heatFlow({
      glycol: 'ethylene',
      percent: 0,
      basis: 'volume',
      litresPerMinute: 30,
      inletCelsius: 88,
      outletCelsius: 82,
    });
    withinOnePercent(r.kilowatts, byHand(30, 968.67, 4199.8, 6));
  });

  it('reads typed units: 10 gal/min, 195 degF in, 185 degF out', () => {
    const r = heatFlow({
      glycol: 'ethylene',
      percent: 50,
      basis: 'volume',
      litresPerMinute: '10 gal/min',
      inletCelsius: '195 degF',
      outletCelsius: '185 degF',
    });
    // 10 US gal/min = 37.854 L/min; mean 87.8 °C lies between the 85 and 90 °C rows.
    const density = 1034.8 + ((1031.0 - 1034.8) * (r.meanCelsius - 85)) / 5;
    const cp = 3532 + ((3551 - 3532) * (r.meanCelsius - 85)) / 5;
    withinOnePercent(r.kilowatts, byHand(37.854, density, cp, 50 / 9));
  });

  it('borrows the 50 % temperature slope for 40 vol % away from 85 °C, and says so', () => {
    const r = heatFlow({
      glycol: 'ethylene',
      percent: 40,
      basis: 'volume',
      litresPerMinute: 30,
      inletCelsius: 84,
      outletCelsius: 78,
    });
    expect(r.warnings.map((w) => w.code)).toEqual(['properties-approximated']);
  });

  it('refuses where the table has no data: mean outside 80–90 °C, 0–40 vol %, over 60 vol %, propylene glycol', () => {
    const base = {
      glycol: 'ethylene',
      percent: 50,
      basis: 'volume',
      litresPerMinute: 30,
      inletCelsius: 88,
      outletCelsius: 82,
    } as const;
    expect(() => heatFlow({ ...base, inletCelsius: 100, outletCelsius: 95 })).toThrow(
      CoolantInputError,
    );
    expect(() => heatFlow({ ...base, inletCelsius: 75, outletCelsius: 70 })).toThrow(
      CoolantInputError,
    );
    expect(() => heatFlow({ ...base, percent: 30 })).toThrow(CoolantInputError);
    expect(() => heatFlow({ ...base, percent: 65 })).toThrow(CoolantInputError);
    expect(() => heatFlow({ ...base, glycol: 'propylene' })).toThrow(/propylene/);
  });
});

function iapwsAvailable(): boolean {
  try {
    execFileSync('/usr/bin/python3', ['-c', 'import iapws'], { stdio: 'ignore' });
    return true;
  } catch {
    return false;
  }
}
const HAVE_IAPWS = iapwsAvailable();

describe('heatFlow — water away from 85 °C against IAPWS-IF97 through the iapws Python library', () => {
  it.skipIf(!HAVE_IAPWS)(
    HAVE_IAPWS
      ? 'holding the 85 °C water properties stays within 1 % of iapws at 80 and 90 °C'
      : 'SKIPPED: the iapws Python library (Debian python3-iapws) is not importable by /usr/bin/python3',
    () => {
      const script =
        'import json\nfrom iapws import IAPWS97\nprint(json.dumps([[IAPWS97(P=0.2, T=t + 273.15).rho, IAPWS97(P=0.2, T=t + 273.15).cp * 1000] for t in (80, 90)]))';
      const rows = JSON.parse(
        execFileSync('/usr/bin/python3', ['-c', script], { encoding: 'utf8' }),
      ) as [number, number][];
      [80, 90].forEach((mean, i) => {
        const [density, cp] = rows[i] ?? [NaN, NaN];
        const r = heatFlow({
          glycol: 'propylene',
          percent: 0,
          basis: 'mass',
          litresPerMinute: 30,
          inletCelsius: mean + 3,
          outletCelsius: mean - 3,
        });
        withinOnePercent(r.kilowatts, byHand(30, density, cp, 6));
        expect(r.warnings.map((w) => w.code)).toEqual(['properties-approximated']);
      });
    },
  );
});
