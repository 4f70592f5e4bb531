// Every public computation refuses nonsense with a CoolantInputError naming the option at fault,
// instead of returning a figure built on it.
import { describe, expect, it } from 'vitest';
import {
  assessTemperatureDrop,
  boilingPoint,
  concentrationForFreezePoint,
  CoolantInputError,
  freezePoint,
  heatFlow,
  mixAdjustment,
  pressureTest,
} from './index.js';

function fieldOf(run: () => unknown): string {
  try {
    run();
  } catch (e) {
    if (e instanceof CoolantInputError) {
      expect(e.name).toBe('CoolantInputError');
      expect(e.message.length).toBeGreaterThan(10);
      return e.field;
    }
    throw e;
  }
  throw new Error('expected a CoolantInputError');
}

const heat = {
  glycol: 'ethylene',
  percent: 50,
  basis: 'volume',
  litresPerMinute: 30,
  inletCelsius: 88,
  outletCelsius: 82,
} as const;

describe('bad input is refused with CoolantInputError and its field', () => {
  it.each<[string, () => unknown, string]>([
    [
      'percent over 100',
      () => freezePoint({ glycol: 'ethylene', percent: 120, basis: 'volume' }),
      'percent',
    ],
    [
      'percent below 0',
      () => freezePoint({ glycol: 'ethylene', percent: -5, basis: 'volume' }),
      'percent',
    ],
    [
      'percent NaN',
      () => freezePoint({ glycol: 'ethylene', percent: NaN, basis: 'volume' }),
      'percent',
    ],
    [
      'percent as a unit',
      () => freezePoint({ glycol: 'ethylene', percent: '50 kg', basis: 'volume' }),
      'percent',
    ],
    [
      'unknown glycol',
      () => freezePoint({ glycol: 'mixed' as 'ethylene', percent: 50, basis: 'volume' }),
      'glycol',
    ],
    [
      'unknown basis',
      () => freezePoint({ glycol: 'ethylene', percent: 50, basis: 'weight' as 'mass' }),
      'basis',
    ],
    [
      'target below absolute zero',
      () => concentrationForFreezePoint({ glycol: 'ethylene', celsius: -300, basis: 'mass' }),
      'celsius',
    ],
    [
      'target as a pressure',
      () => concentrationForFreezePoint({ glycol: 'ethylene', celsius: '2 bar', basis: 'mass' }),
      'celsius',
    ],
    [
      'negative litres',
      () =>
        mixAdjustment({
          glycol: 'ethylene',
          systemLitres: -1,
          currentPercent: 30,
          targetPercent: 50,
        }),
      'systemLitres',
    ],
    [
      'litres as a mass',
      () =>
        mixAdjustment({
          glycol: 'ethylene',
          systemLitres: '5 kg',
          currentPercent: 30,
          targetPercent: 50,
        }),
      'systemLitres',
    ],
    [
      'Infinity litres',
      () =>
        mixAdjustment({
          glycol: 'ethylene',
          systemLitres: Infinity,
          currentPercent: 30,
          targetPercent: 50,
        }),
      'systemLitres',
    ],
    [
      'current over 100',
      () =>
        mixAdjustment({
          glycol: 'ethylene',
          systemLitres: 8,
          currentPercent: 130,
          targetPercent: 50,
        }),
      'currentPercent',
    ],
    [
      'add below 0',
      () =>
        mixAdjustment({
          glycol: 'ethylene',
          systemLitres: 8,
          currentPercent: 30,
          targetPercent: 50,
          addPercent: -10,
        }),
      'addPercent',
    ],
    ['gauge below vacuum', () => boilingPoint({ gaugeBar: -1.5 }), 'gaugeBar'],
    ['gauge NaN', () => boilingPoint({ gaugeBar: NaN }), 'gaugeBar'],
    ['gauge as a temperature', () => boilingPoint({ gaugeBar: '100 degC' }), 'gaugeBar'],
    ['negative flow', () => heatFlow({ ...heat, litresPerMinute: -3 }), 'litresPerMinute'],
    ['flow as a volume', () => heatFlow({ ...heat, litresPerMinute: '3 L' }), 'litresPerMinute'],
    [
      'inlet below absolute zero',
      () => heatFlow({ ...heat, inletCelsius: '-500 degF' }),
      'inletCelsius',
    ],
    [
      'outlet as a mass',
      () => assessTemperatureDrop({ circuit: 'engine', inletCelsius: 85, outletCelsius: '5 kg' }),
      'outletCelsius',
    ],
    [
      'negative minutes',
      () => pressureTest({ startBar: 1, endBar: 1, minutes: -1, capRatingBar: 1 }),
      'minutes',
    ],
    [
      'minutes as a length',
      () => pressureTest({ startBar: 1, endBar: 1, minutes: '10 m', capRatingBar: 1 }),
      'minutes',
    ],
  ])('%s', (_label, run, field) => {
    expect(fieldOf(run)).toBe(field);
  });
});

// Values that can be typed but no road vehicle can show (issue 13). The limits are Heatpath's,
// from common practice: caps 0.9–1.6 bar, car systems 5–15 L, car pumps roughly 50–250 L/min.
describe('figures no vehicle can show are refused, not computed', () => {
  it.each<[string, () => unknown, string]>([
    [
      'a 30 bar cap in the pressure test',
      () => pressureTest({ startBar: 30, endBar: 30, minutes: 15, capRatingBar: 30 }),
      'capRatingBar',
    ],
    ['a 30 bar cap in the boiling point', () => boilingPoint({ gaugeBar: 30 }), 'gaugeBar'],
    [
      'a 5,000 L system',
      () =>
        mixAdjustment({
          glycol: 'ethylene',
          systemLitres: 5000,
          currentPercent: 30,
          targetPercent: 50,
        }),
      'systemLitres',
    ],
    ['1,000,000 L/min', () => heatFlow({ ...heat, litresPerMinute: 1_000_000 }), 'litresPerMinute'],
    ['a 400 °C coolant reading', () => heatFlow({ ...heat, inletCelsius: 400 }), 'inletCelsius'],
    [
      'a 2.5 bar test on a 1.0 bar system',
      () => pressureTest({ startBar: 2.5, endBar: 2.5, minutes: 15, capRatingBar: 1.0 }),
      'startBar',
    ],
  ])('%s', (_label, run, field) => {
    expect(fieldOf(run)).toBe(field);
  });

  it('keeps what a real vehicle can show: a 1.4 bar cap, a 120 L truck system, 300 L/min', () => {
    expect(
      pressureTest({ startBar: 1.4, endBar: 1.4, minutes: 15, capRatingBar: 1.4 }).verdict,
    ).toBe('holds');
    expect(
      mixAdjustment({
        glycol: 'ethylene',
        systemLitres: 120,
        currentPercent: 30,
        targetPercent: 50,
      }).drainLitres,
    ).toBeGreaterThan(0);
    expect(heatFlow({ ...heat, litresPerMinute: 300 }).kilowatts).toBeGreaterThan(0);
  });
});
