// The band of readings liquid coolant can give. Its ends come from figures outside the project:
// the coldest freezing points in the ASHRAE tables (EG −48.3 °C at 60 mass %, PG −51.1 °C at
// 60 mass %; trade-facts.md) and water's IAPWS-IF97 boiling point under the largest cap Heatpath
// accepts (3 bar gauge → about 143.6 °C), with a glycol mix boiling somewhat higher.
import { describe, expect, it } from 'vitest';
import { boilingPoint } from './boiling-point.js';
import {
  COOLANT_READING_LIMITS,
  isPlausibleCoolantCelsius,
  readCoolantTemperature,
} from './coolant-temperature.js';
import { CoolantInputError } from './errors.js';

describe('coolant readings', () => {
  it('the band covers the coldest handbook mixes and the boiling point under a 3 bar cap', () => {
    expect(COOLANT_READING_LIMITS.minCelsius).toBeLessThan(-51.1);
    const water3bar = boilingPoint({ gaugeBar: 3 }).celsius;
    expect(water3bar).toBeGreaterThan(143);
    expect(COOLANT_READING_LIMITS.maxCelsius).toBeGreaterThan(water3bar);
  });

  it('accepts ordinary readings, in °C or typed °F', () => {
    expect(readCoolantTemperature(92, 'running')).toBe(92);
    expect(readCoolantTemperature('-40 degF', 'running')).toBeCloseTo(-40, 9);
    expect(isPlausibleCoolantCelsius(-55)).toBe(true);
  });

  it('refuses a reading no liquid coolant can give, naming the box', () => {
    for (const reading of [500, 151, -60, '400 degF']) {
      try {
        readCoolantTemperature(reading, 'running');
        expect.fail(`expected ${String(reading)} to be refused`);
      } catch (error) {
        expect(error).toBeInstanceOf(CoolantInputError);
        expect((error as CoolantInputError).field).toBe('running');
        expect((error as Error).message).toMatch(/not a liquid coolant temperature/);
      }
    }
  });
});
