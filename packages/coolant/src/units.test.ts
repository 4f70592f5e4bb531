// Unit handling checked against js-quantities, a general-purpose unit library from the npm
// registry, rather than against conversion factors written into the project.
import fc from 'fast-check';
import Qty from 'js-quantities';
import { create, unitDependencies } from 'mathjs';
import type { FactoryFunctionMap } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { CoolantInputError } from './errors.js';
import { formatQuantity, fromCanonical, toCanonical } from './units.js';

// js-quantities rounds its results to about 1e-7 relative.
function close(actual: number, expected: number): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(1e-6 * Math.max(1, Math.abs(expected)));
}

describe('toCanonical — against js-quantities (npm registry)', () => {
  it.each([
    ['195 degF', '195 tempF'],
    ['195 °F', '195 tempF'],
    ['195 F', '195 tempF'],
    ['-40 degF', '-40 tempF'],
    ['373.15 K', '373.15 tempK'],
  ])('temperature %s', (typed, qty) => {
    close(toCanonical(typed, 'temperature'), Qty(qty).to('tempC').scalar);
  });

  it.each([
    ['15 psi', '15 psi'],
    ['15 psig', '15 psi'],
    ['100 kPa', '100 kPa'],
    ['1.2 bar', '1.2 bar'],
  ])('pressure %s', (typed, qty) => {
    close(toCanonical(typed, 'pressure'), Qty(qty).to('bar').scalar);
  });

  it.each([
    ['6 qt', '6 qt'],
    ['2 gal', '2 gal'],
    ['7.5 L', '7.5 l'],
  ])('volume %s (US liquid measure)', (typed, qty) => {
    close(toCanonical(typed, 'volume'), Qty(qty).to('l').scalar);
  });

  it('volume flow 10 gal/min', () => {
    close(toCanonical('10 gal/min', 'volumeFlow'), Qty('10 gal/min').to('l/min').scalar);
  });

  it('temperature difference 9 degF is 5 K (no offset)', () => {
    close(toCanonical('9 degF', 'temperatureDelta'), Qty('9 degF').to('degC').scalar);
  });

  it('duration 0.5 h', () => {
    close(toCanonical('0.5 h', 'time'), Qty('0.5 h').to('min').scalar);
  });

  it('accepts mathjs Unit objects from another instance', () => {
    const other = create({ unitDependencies: unitDependencies as FactoryFunctionMap });
    close(toCanonical(other.unit(200, 'degF'), 'temperature'), Qty('200 tempF').to('tempC').scalar);
  });

  it('°F → °C over the whole range matches js-quantities (fast-check)', () => {
    fc.assert(
      fc.property(fc.double({ min: -459, max: 1000, noNaN: true }), (f) => {
        const ours = toCanonical(`${f} degF`, 'temperature');
        const theirs = Qty(`${f} tempF`).to('tempC').scalar;
        return Math.abs(ours - theirs) <= 1e-6 * Math.max(1, Math.abs(theirs));
      }),
    );
  });
});

describe('fromCanonical and formatQuantity — against js-quantities', () => {
  it('°C → °F, bar → psi, L → qt', () => {
    close(fromCanonical(90, 'temperature', 'degF'), Qty('90 tempC').to('tempF').scalar);
    close(fromCanonical(1.1, 'pressure', 'psi'), Qty('1.1 bar').to('psi').scalar);
    close(fromCanonical(8, 'volume', 'qt'), Qty('8 l').to('qt').scalar);
    close(fromCanonical(5, 'temperatureDelta', 'degF'), Qty('5 degC').to('degF').scalar);
  });

  it('formats with symbols and digits', () => {
    expect(formatQuantity(90, 'temperature', { unit: 'degF' })).toBe(
      `${Qty('90 tempC').to('tempF').scalar.toFixed(1)} °F`,
    );
    expect(formatQuantity(1.1, 'pressure', { unit: 'psi', digits: 0 })).toBe('16 psi');
    expect(formatQuantity(-37.04, 'temperature')).toBe('-37.0 °C');
    expect(formatQuantity(-0.01, 'temperature')).toBe('0.0 °C');
    expect(formatQuantity(50, 'percentage', { digits: 0 })).toBe('50 %');
  });
});

describe('toCanonical — rejects nonsense with CoolantInputError', () => {
  it.each([
    ['5 kg', 'temperature'],
    ['90', 'nothing'],
    ['abc', 'temperature'],
    ['', 'temperature'],
    ['-300 degC', 'temperature'],
    ['-1 K', 'temperature'],
    ['-500 degF', 'temperature'],
    ['1e400', 'temperature'],
    ['2 L', 'pressure'],
    ['-3 bar', 'pressure'],
    ['-1 L', 'volume'],
    ['-2 qt', 'volume'],
    ['5 psi', 'volume'],
    ['101', 'percentage'],
    ['-1 %', 'percentage'],
    ['fifty', 'percentage'],
    ['-5 min', 'time'],
  ])('%s as %s', (typed, quantity) => {
    const q = quantity === 'nothing' ? 'temperature' : quantity;
    const value = quantity === 'nothing' ? { value: typed } : typed;
    expect(() => toCanonical(value as unknown as string, q as 'temperature', 'field')).toThrow(
      CoolantInputError,
    );
  });

  it.each([NaN, Infinity, -Infinity])('%d as a number', (n) => {
    expect(() => toCanonical(n, 'volume')).toThrow(CoolantInputError);
  });

  it('names the field and speaks plainly', () => {
    try {
      toCanonical('5 kg', 'temperature', 'inletCelsius');
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(CoolantInputError);
      expect((e as CoolantInputError).field).toBe('inletCelsius');
      expect((e as CoolantInputError).message).toBe(
        '"5 kg" is not a temperature; expected something like "90 degC" or "195 degF".',
      );
    }
  });
});
