// VIN form and check digit, against the published rules and worked example.
import { describe, expect, it } from 'vitest';
import { checkVin, vinCheckDigit } from './vin';

describe('checkVin', () => {
  it('accepts the widely printed worked example 1M8GDM9AXKP042788 (49 CFR 565.15)', () => {
    expect(vinCheckDigit('1M8GDM9AXKP042788')).toBe('X');
    expect(checkVin('1M8GDM9AXKP042788')).toMatchObject({
      valid: true,
      checkDigit: 'matches',
      warning: null,
    });
  });

  it('warns, without refusing, when position 9 does not match (49 CFR 565.15)', () => {
    const result = checkVin('1M8GDM9A1KP042788');
    expect(result.valid).toBe(true);
    expect(result.checkDigit).toBe('mismatch');
    expect(result.warning).toMatch(/check digit would be "X"/);
  });

  it('refuses I, O and Q and wrong lengths (ISO 3779)', () => {
    expect(checkVin('1M8GDM9AXKP04278O').problem).toMatch(/I, O or Q/);
    expect(checkVin('1M8GDM9AXKP0427').problem).toMatch(/17 characters; this one has 15/);
    expect(checkVin('1M8GDM9AXKP04278!').problem).toMatch(/capital letters and digits/);
  });

  it('ignores spaces, dashes and letter case', () => {
    expect(checkVin(' 1m8gdm9a-xkp042788 ').vin).toBe('1M8GDM9AXKP042788');
  });
});
