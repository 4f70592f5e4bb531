// The scalar functions tree formulas call, checked against the same outside figures as the full
// functions, and checked to work inside a restricted mathjs scope as the fault-tree package uses them.
import { create, evaluateDependencies, smallerDependencies, subtractDependencies } from 'mathjs';
import type { FactoryFunctionMap } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { CoolantInputError } from './errors.js';
import { formulaFunctions } from './formula-functions.js';
import { formulaFunctions as fromIndex } from './index.js';

describe('formulaFunctions', () => {
  it('is exported from the package index with its four names', () => {
    expect(Object.keys(fromIndex).sort()).toEqual([
      'egFreezePoint',
      'pgFreezePoint',
      'temperatureDrop',
      'waterBoilingPoint',
    ]);
  });

  it('egFreezePoint(50) is about −37.0 °C (trade-facts.md: ASHRAE table interpolated to 50 vol %)', () => {
    expect(Math.abs(formulaFunctions.egFreezePoint(50) - -37.0)).toBeLessThanOrEqual(0.3);
  });

  it('egFreezePoint(47.6) is −33.8 °C (Source A: ASHRAE Handbook—Fundamentals, 50 mass % row)', () => {
    expect(Math.abs(formulaFunctions.egFreezePoint(47.6) - -33.8)).toBeLessThanOrEqual(0.3);
  });

  it('pgFreezePoint(49.9) is −33.5 °C (Source A, ASHRAE, as above)', () => {
    expect(Math.abs(formulaFunctions.pgFreezePoint(49.9) - -33.5)).toBeLessThanOrEqual(0.3);
  });

  it('throws above the table rather than returning a figure (over-concentrated)', () => {
    expect(() => formulaFunctions.egFreezePoint(65)).toThrow(CoolantInputError);
    expect(() => formulaFunctions.egFreezePoint(65)).toThrow(/over-concentrated/i);
    expect(() => formulaFunctions.pgFreezePoint(61)).toThrow(CoolantInputError);
    expect(() => formulaFunctions.egFreezePoint(-1)).toThrow(CoolantInputError);
  });

  it('waterBoilingPoint matches the trade-facts.md IAPWS-IF97 examples (1.0 → 120.42, 1.4 → 126.25 °C)', () => {
    expect(formulaFunctions.waterBoilingPoint(1.0)).toBeCloseTo(120.42, 2);
    expect(formulaFunctions.waterBoilingPoint(1.4)).toBeCloseTo(126.25, 2);
  });

  it('waterBoilingPoint refuses a 30 bar "cap" rather than give a figure (no vehicle cap is rated above 3 bar; common practice)', () => {
    expect(() => formulaFunctions.waterBoilingPoint(30)).toThrow(CoolantInputError);
  });

  it('temperatureDrop is inlet − outlet in K', () => {
    expect(formulaFunctions.temperatureDrop(95, 88.5)).toBeCloseTo(6.5, 12);
    expect(() => formulaFunctions.temperatureDrop(-300, 20)).toThrow(CoolantInputError);
  });

  it('rejects non-numbers and non-finite numbers', () => {
    expect(() => formulaFunctions.waterBoilingPoint('1' as unknown as number)).toThrow(
      CoolantInputError,
    );
    expect(() => formulaFunctions.waterBoilingPoint(NaN)).toThrow(CoolantInputError);
  });

  it('works inside a mathjs expression scope', () => {
    const math = create({
      evaluateDependencies: evaluateDependencies as FactoryFunctionMap,
      subtractDependencies: subtractDependencies as FactoryFunctionMap,
      smallerDependencies: smallerDependencies as FactoryFunctionMap,
    });
    math.import({ ...formulaFunctions }, { override: true });
    expect(
      math.evaluate('waterBoilingPoint(1.0) - temperatureDrop(100, 94)') as number,
    ).toBeCloseTo(114.42, 2);
    expect(math.evaluate('egFreezePoint(50) < -36') as boolean).toBe(true);
  });
});
