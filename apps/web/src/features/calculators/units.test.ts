import { describe, expect, it } from 'vitest';
import { displayUnits, percentText, quantityText, withMinus } from './units';

describe('calculator units', () => {
  it('maps remembered choices to the coolant package’s display units', () => {
    expect(displayUnits({ temperature: 'F', pressure: 'psi', volume: 'qt' })).toEqual({
      temperature: 'degF',
      temperatureDifference: 'degF',
      pressure: 'psi',
      volume: 'qt',
      volumeFlow: 'gal/min',
    });
    expect(
      displayUnits({ temperature: 'C', pressure: 'bar', volume: 'L' }).temperatureDifference,
    ).toBe('K');
  });

  it('gives a bare number the unit shown beside the box, and keeps a typed unit', () => {
    expect(quantityText(' 1,2 ', 'bar')).toBe('1.2 bar');
    expect(quantityText('−37', 'degC')).toBe('-37 degC');
    expect(quantityText('195 F', 'degC')).toBe('195 F');
    expect(quantityText('abc', 'degC')).toBe('abc');
  });

  it('reads a decimal comma in percentages and shows a true minus', () => {
    expect(percentText('47,5')).toBe('47.5');
    expect(percentText('50 %')).toBe('50 %');
    expect(withMinus('-37.0 °C')).toBe('−37.0 °C');
  });
});
