import { describe, expect, it } from 'vitest';
import { fromCanonical, toCanonical } from './convert-units.js';
import { formatComputed, formatRange } from './format-value.js';

describe('unit conversion to canonical units', () => {
  it('converts absolute temperatures with their offset', () => {
    expect(toCanonical(221, 'degF', 'temperature')).toBe(105);
    expect(toCanonical(-40, 'degF', 'temperature')).toBe(-40);
    expect(toCanonical(194, 'degF', 'temperature')).toBe(90);
  });

  it('converts temperature differences without an offset', () => {
    expect(toCanonical(9, 'degF', 'temperatureDelta')).toBe(5);
    expect(fromCanonical(5, 'degF', 'temperatureDelta')).toBe(9);
  });

  it('converts pressure, volume and time', () => {
    // 1 psi = 0.0689476 bar (definition of the pound-force per square inch).
    expect(toCanonical(15, 'psi', 'pressure')).toBeCloseTo(1.034214, 5);
    expect(toCanonical(120, 'kPa', 'pressure')).toBeCloseTo(1.2, 10);
    // 1 US liquid quart = 0.946352946 L (exact by definition).
    expect(toCanonical(2, 'qt', 'volume')).toBeCloseTo(1.892705892, 9);
    expect(toCanonical(90, 's', 'time')).toBe(1.5);
    expect(toCanonical(50, '%', 'percentage')).toBe(50);
  });

  it('refuses a unit the quantity does not take', () => {
    expect(() => toCanonical(1, 'psi', 'temperature')).toThrow(RangeError);
  });

  it('names a range in the entered and the canonical unit', () => {
    expect(formatRange({ min: -40, max: 150 }, 'temperature', 'degF')).toBe(
      'between -40 and 302 °F (-40 and 150 °C)',
    );
    expect(formatRange({ min: 0.3, max: 2.5 }, 'pressure')).toBe('between 0.3 and 2.5 bar');
  });
});

describe('formatComputed: worked-out values shown no finer than their inputs', () => {
  // Refractometer readings are good to about ±1 K (ASTM D3321) and handbooks differ by 2–3 K at
  // 50–60 % (trade-facts.md), so a freezing point is shown in whole degrees; IAPWS-IF97 gives
  // 126.25 °C at 1.4 bar gauge (trade-facts.md), shown as 126 °C.
  it('rounds temperatures to whole degrees, differences to a tenth, pressures to a hundredth', () => {
    expect(formatComputed(-37.17, 'temperature')).toBe('-37 °C');
    expect(formatComputed(126.25, 'temperature')).toBe('126 °C');
    expect(formatComputed(103.89, 'temperature', 'degF')).toBe('219 °F');
    expect(formatComputed(6.04, 'temperatureDelta')).toBe('6 K');
    expect(formatComputed(6.56, 'temperatureDelta')).toBe('6.6 K');
    expect(formatComputed(0.0234, 'pressure')).toBe('0.02 bar');
    expect(formatComputed(12.5, 'percentage')).toBe('12.5 %');
  });
});
