// The inverse of the freezing-point table: checked against the same handbook rows and by
// round-tripping through freezePoint.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { concentrationForFreezePoint } from './concentration-for-freeze-point.js';
import { CoolantInputError } from './errors.js';
import { freezePoint } from './freeze-point.js';

describe('concentrationForFreezePoint — Source A: ASHRAE Handbook—Fundamentals (±0.3 % at table rows)', () => {
  it.each([
    // [target °C, mass %, vol %] — ethylene glycol rows of the ASHRAE table in trade-facts.md
    [-22.3, 40, 37.5],
    [-33.8, 50, 47.6],
    [-48.3, 60, 57.8],
  ])('ethylene: %d °C needs %d mass %% / %d vol %%', (celsius, mass, vol) => {
    const byMass = concentrationForFreezePoint({ glycol: 'ethylene', celsius, basis: 'mass' });
    const byVolume = concentrationForFreezePoint({ glycol: 'ethylene', celsius, basis: 'volume' });
    expect(Math.abs(byMass.percent - mass)).toBeLessThan(0.3);
    expect(Math.abs(byVolume.percent - vol)).toBeLessThan(0.3);
  });

  it('propylene: −33.5 °C needs 50 mass % / 49.9 vol % (Source A, ASHRAE, as above)', () => {
    const r = concentrationForFreezePoint({ glycol: 'propylene', celsius: -33.5, basis: 'volume' });
    expect(Math.abs(r.percent - 49.9)).toBeLessThan(0.3);
  });

  it('−37.0 °C needs about 50 vol % ethylene glycol (trade-facts.md: the table at 50 vol % gives about −37.0 °C)', () => {
    const r = concentrationForFreezePoint({ glycol: 'ethylene', celsius: -37, basis: 'volume' });
    expect(Math.abs(r.percent - 50)).toBeLessThan(0.5);
  });

  it('reads a typed Fahrenheit target: −34 °F = −36.7 °C', () => {
    const r = concentrationForFreezePoint({
      glycol: 'ethylene',
      celsius: '-34 degF',
      basis: 'volume',
    });
    const back =
      freezePoint({ glycol: 'ethylene', percent: r.percent, basis: 'volume' }).celsius ?? NaN;
    expect(back).toBeCloseTo(((-34 - 32) * 5) / 9, 6);
  });

  it('refuses a target colder than any mix reaches (the table bottoms out at −48.3 °C for EG)', () => {
    expect(() =>
      concentrationForFreezePoint({ glycol: 'ethylene', celsius: -55, basis: 'volume' }),
    ).toThrow(CoolantInputError);
    try {
      concentrationForFreezePoint({ glycol: 'ethylene', celsius: -55, basis: 'volume' });
    } catch (e) {
      expect(e).toBeInstanceOf(CoolantInputError);
      expect((e as CoolantInputError).field).toBe('celsius');
      expect((e as CoolantInputError).message).toMatch(/No ethylene glycol mix protects to −?-?55/);
    }
  });

  it('needs no glycol for a target above 0 °C, and says the mix is still needed for corrosion', () => {
    const r = concentrationForFreezePoint({ glycol: 'propylene', celsius: 3, basis: 'mass' });
    expect(r.percent).toBe(0);
    expect(r.warnings.map((w) => w.code)).toEqual(['no-glycol-needed']);
  });

  it.each(['ethylene', 'propylene'] as const)(
    '%s: round-trips through freezePoint (fast-check)',
    (glycol) => {
      const coldest = glycol === 'ethylene' ? -48.3 : -51.1;
      fc.assert(
        fc.property(
          fc.double({ min: coldest, max: -0.01, noNaN: true }),
          fc.constantFrom('mass' as const, 'volume' as const),
          (celsius, basis) => {
            const { percent } = concentrationForFreezePoint({ glycol, celsius, basis });
            const back = freezePoint({ glycol, percent, basis }).celsius ?? NaN;
            return Math.abs(back - celsius) < 1e-6;
          },
        ),
      );
    },
  );

  it.each(['ethylene', 'propylene'] as const)(
    '%s: freezePoint then inverse returns the concentration (fast-check)',
    (glycol) => {
      fc.assert(
        fc.property(fc.double({ min: 0.5, max: 60, noNaN: true }), (mass) => {
          const celsius = freezePoint({ glycol, percent: mass, basis: 'mass' }).celsius ?? NaN;
          const { percent } = concentrationForFreezePoint({ glycol, celsius, basis: 'mass' });
          return Math.abs(percent - mass) < 1e-6;
        }),
      );
    },
  );
});
