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
