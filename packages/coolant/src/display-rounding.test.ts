// Rounding of figures shown to people. The precision chosen for each kind is Heatpath's judgement
// (reasons in display-rounding.ts); the unit conversions behind °F, psi and quarts are checked
// against js-quantities, a conversion library outside the project.
import Qty from 'js-quantities';
import { describe, expect, it } from 'vitest';
import {
  formatFigure,
  formatSignificant,
  roundForDisplay,
  roundSignificant,
} from './display-rounding.js';

describe('formatFigure — freezing and boiling points', () => {
  it('a freezing point to whole degrees: −37.17 °C shows as −37 °C (refractometer ±1 K, ASTM D3321)', () => {
    expect(formatFigure(-37.17, 'freezePoint')).toBe('-37 °C');
    expect(formatFigure(-0.3, 'freezePoint')).toBe('0 °C');
  });

  it('the same freezing point in °F is whole degrees too (js-quantities: −37.17 °C = −34.9 °F)', () => {
    const fahrenheit = Qty(-37.17, 'tempC').to('tempF').scalar;
    expect(formatFigure(-37.17, 'freezePoint', 'degF')).toBe(`${Math.round(fahrenheit)} °F`);
  });

  it('a boiling point to whole degrees: 103.89 °C shows as 104 °C (cap opens within about ±0.1 bar)', () => {
    expect(formatFigure(103.89, 'boilingPoint')).toBe('104 °C');
    expect(formatFigure(126.25, 'boilingPoint', 'degF')).toBe(
      `${Math.round(Qty(126.25, 'tempC').to('tempF').scalar)} °F`,
    );
  });
});

describe('formatFigure — other quantities keep a step at least as fine in any unit', () => {
  it('pressure: 2 decimals of a bar; psi gets 1 decimal (0.01 bar = 0.145 psi, js-quantities)', () => {
    expect(formatFigure(0.6894757, 'pressure')).toBe('0.69 bar');
    const psi = Qty(0.6894757, 'bar').to('psi').scalar;
    expect(formatFigure(0.6894757, 'pressure', 'psi')).toBe(`${psi.toFixed(1)} psi`);
    expect(formatFigure(1.4, 'pressure', 'kPa')).toBe('140 kPa');
  });

  it('volume: 0.1 L; US quarts 0.1 qt, US gallons 0.01 gal (js-quantities)', () => {
    expect(formatFigure(2.345, 'volume')).toBe('2.3 L');
    expect(formatFigure(2.345, 'volume', 'qt')).toBe(
      `${Qty(2.345, 'l').to('qt').scalar.toFixed(1)} qt`,
    );
    expect(formatFigure(2.345, 'volume', 'gal')).toBe(
      `${Qty(2.345, 'l').to('gal').scalar.toFixed(2)} gal`,
    );
  });

  it('a temperature difference in °F is converted without the offset (5 K = 9 °F)', () => {
    expect(formatFigure(5, 'temperatureDifference', 'degF')).toBe('9.0 °F');
    expect(formatFigure(5, 'boilingMargin', 'degF')).toBe('9 °F');
  });

  it('roundForDisplay gives the number for screens that build their own text', () => {
    expect(roundForDisplay(47.6123, 'concentration')).toBe(48);
    expect(roundForDisplay(-37.17, 'freezePoint', 'degC')).toBe(-37);
    expect(roundForDisplay(-0.2, 'freezePoint')).toBe(0);
    expect(Object.is(roundForDisplay(-0.2, 'freezePoint'), -0)).toBe(false);
  });
});

describe('significant figures — heat flow and properties', () => {
  it('heat flow to 2 significant figures (a ±1 K reading on a 6 K drop is already ±17 %)', () => {
    expect(formatSignificant(24.63, 'heatFlow')).toBe('25 kW');
    expect(formatSignificant(3.449, 'heatFlow')).toBe('3.4 kW');
    expect(formatSignificant(125.4, 'heatFlow')).toBe('130 kW');
  });

  it('density and specific heat to 3 (sources differ by up to 1 %, trade-facts.md)', () => {
    expect(formatSignificant(1034.77, 'density')).toBe('1030 kg/m³');
    expect(formatSignificant(3532, 'specificHeat')).toBe('3530 J/(kg·K)');
    expect(roundSignificant(-0.000049, 1)).toBe(-0.00005);
    expect(roundSignificant(0, 2)).toBe(0);
  });
});
