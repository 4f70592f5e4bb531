import { describe, expect, it } from 'vitest';
import { readNumber, readOptionalNumber } from './read-number';

describe('readNumber', () => {
  it('is null for an empty or blank box', () => {
    expect(readNumber('')).toBeNull();
    expect(readNumber('   ')).toBeNull();
  });

  it('reads plain figures, signs and surrounding spaces', () => {
    expect(readNumber('92.5')).toBe(92.5);
    expect(readNumber(' 7 ')).toBe(7);
    expect(readNumber('-40')).toBe(-40);
    expect(readNumber('+3')).toBe(3);
    expect(readNumber('.5')).toBe(0.5);
    expect(readNumber('12.')).toBe(12);
  });

  it('accepts a decimal comma and a true minus sign', () => {
    expect(readNumber('1,4')).toBe(1.4);
    expect(readNumber('−12,5')).toBe(-12.5);
  });

  it('refuses what is not a plain number with NaN', () => {
    for (const text of ['abc', '1e3', '0x10', 'Infinity', '1.2.3', '1,2,3', '--1', '5 °C', '-']) {
      expect(readNumber(text)).toBeNaN();
    }
  });
});

describe('readOptionalNumber', () => {
  it('is the number, or undefined for an empty box or text that is not one', () => {
    expect(readOptionalNumber('2,5')).toBe(2.5);
    expect(readOptionalNumber('')).toBeUndefined();
    expect(readOptionalNumber('two')).toBeUndefined();
  });
});
