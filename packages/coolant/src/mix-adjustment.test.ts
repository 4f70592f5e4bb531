// Drain-and-refill amounts checked against the volume balance worked by hand (common practice:
// drain x of the present mix, refill x of the add liquid) and by property tests.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CoolantInputError } from './errors.js';
import { mixAdjustment } from './mix-adjustment.js';

describe('mixAdjustment — volume balance worked by hand (common practice)', () => {
  it('8 L at 30 % to 50 % with concentrate: drain 8·20/70 = 2.286 L', () => {
    const r = mixAdjustment({
      glycol: 'ethylene',
      systemLitres: 8,
      currentPercent: 30,
      targetPercent: 50,
    });
    expect(r.drainLitres).toBeCloseTo((8 * 20) / 70, 9);
    expect(r.addLitres).toBe(r.drainLitres);
    expect(r.addLiquid).toBe('concentrate');
    expect(r.resultingPercent).toBeCloseTo(50, 9);
    expect(r.basis).toBe('volume');
  });

  it('10 L at 65 % down to 50 % with water: drain 10·15/65 = 2.308 L', () => {
    const r = mixAdjustment({
      glycol: 'ethylene',
      systemLitres: 10,
      currentPercent: 65,
      targetPercent: 50,
    });
    expect(r.drainLitres).toBeCloseTo((10 * 15) / 65, 9);
    expect(r.addPercent).toBe(0);
    expect(r.addLiquid).toBe('water');
  });

  it('reads "6 qt" (US liquid quart, 0.946353 L): 6 qt at 40 % to 50 % drains 5.678·10/60 L', () => {
    const r = mixAdjustment({
      glycol: 'propylene',
      systemLitres: '6 qt',
      currentPercent: 40,
      targetPercent: '50 %',
    });
    expect(r.drainLitres).toBeCloseTo((6 * 0.946352946 * 10) / 60, 6);
  });

  it('with a 50 % premix, 30 % → 50 % means replacing everything, and says so', () => {
    const r = mixAdjustment({
      glycol: 'ethylene',
      systemLitres: 7,
      currentPercent: 30,
      targetPercent: 50,
      addPercent: 50,
    });
    expect(r.drainLitres).toBeCloseTo(7, 9);
    expect(r.warnings.map((w) => w.code)).toContain('full-replacement');
  });

  it('gives the freezing point of the result from the ASHRAE table (about −37.0 °C at 50 vol % EG)', () => {
    const r = mixAdjustment({
      glycol: 'ethylene',
      systemLitres: 8,
      currentPercent: 30,
      targetPercent: 50,
    });
    expect(Math.abs((r.resultingFreezeCelsius ?? NaN) - -37.0)).toBeLessThanOrEqual(0.3);
  });

  it('nothing to do when already at target', () => {
    const r = mixAdjustment({
      glycol: 'ethylene',
      systemLitres: 8,
      currentPercent: 50,
      targetPercent: 50,
    });
    expect(r.drainLitres).toBe(0);
  });

  it('refuses impossible targets', () => {
    expect(() =>
      mixAdjustment({
        glycol: 'ethylene',
        systemLitres: 8,
        currentPercent: 30,
        targetPercent: 60,
        addPercent: 50,
      }),
    ).toThrow(CoolantInputError);
    expect(() =>
      mixAdjustment({
        glycol: 'ethylene',
        systemLitres: 8,
        currentPercent: 60,
        targetPercent: 40,
        addPercent: 50,
      }),
    ).toThrow(CoolantInputError);
    expect(() =>
      mixAdjustment({
        glycol: 'ethylene',
        systemLitres: 8,
        currentPercent: 30,
        targetPercent: 101,
      }),
    ).toThrow(CoolantInputError);
    expect(() =>
      mixAdjustment({ glycol: 'ethylene', systemLitres: 0, currentPercent: 30, targetPercent: 50 }),
    ).toThrow(CoolantInputError);
    expect(() =>
      mixAdjustment({
        glycol: 'ethylene',
        systemLitres: -8,
        currentPercent: 30,
        targetPercent: 50,
      }),
    ).toThrow(/negative/);
  });

  it('the resulting concentration matches the volume balance and the target (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.5, max: 40, noNaN: true }),
        fc.double({ min: 0, max: 100, noNaN: true }),
        fc.double({ min: 0, max: 100, noNaN: true }),
        fc.double({ min: 0, max: 100, noNaN: true }),
        (system, current, target, add) => {
          const possible =
            (target > current && add >= target) ||
            (target < current && add <= target) ||
            target === current;
          fc.pre(possible && Math.abs(add - current) > 1e-6);
          const r = mixAdjustment({
            glycol: 'ethylene',
            systemLitres: system,
            currentPercent: current,
            targetPercent: target,
            addPercent: add,
          });
          const balance = (current * (system - r.drainLitres) + add * r.drainLitres) / system;
          return (
            r.drainLitres >= -1e-9 &&
            r.drainLitres <= system * (1 + 1e-9) &&
            Math.abs(r.resultingPercent - balance) < 1e-9 &&
            Math.abs(r.resultingPercent - target) < 1e-6
          );
        },
      ),
    );
  });

  it('any impossible target is refused, never answered (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 100, noNaN: true }),
        fc.double({ min: 0, max: 100, noNaN: true }),
        fc.double({ min: 0, max: 100, noNaN: true }),
        (current, target, add) => {
          fc.pre((target > current && add < target) || (target < current && add > target));
          try {
            mixAdjustment({
              glycol: 'ethylene',
              systemLitres: 8,
              currentPercent: current,
              targetPercent: target,
              addPercent: add,
            });
            return false;
          } catch (e) {
            return e instanceof CoolantInputError && e.field === 'addPercent';
          }
        },
      ),
    );
  });
});
