// What a coolant temperature reading can be, in one place for every calculator that takes one.
import { CoolantInputError } from './errors.js';
import { formatFigure } from './display-rounding.js';
import { toCanonical } from './units.js';
import type { QuantityInput } from './units.js';

/**
 * Liquid coolant in a road vehicle. The richest mixes in the handbook tables freeze near −48 °C
 * (EG) and −51 °C (PG), so colder than −55 °C is not liquid coolant; under a cap of at most 3 bar
 * (the largest rating Heatpath accepts) even a rich mix boils below about 150 °C, so hotter is not
 * liquid coolant either. A reading outside is a misreading, the wrong unit, or a surface that is
 * not the coolant.
 */
export const COOLANT_READING_LIMITS = { minCelsius: -55, maxCelsius: 150 } as const;

export function isPlausibleCoolantCelsius(celsius: number): boolean {
  return (
    celsius >= COOLANT_READING_LIMITS.minCelsius && celsius <= COOLANT_READING_LIMITS.maxCelsius
  );
}

/** A coolant temperature in °C; throws CoolantInputError when no liquid coolant can read it. */
export function readCoolantTemperature(value: QuantityInput, field: string): number {
  const celsius = toCanonical(value, 'temperature', field);
  if (!isPlausibleCoolantCelsius(celsius)) {
    const { minCelsius, maxCelsius } = COOLANT_READING_LIMITS;
    throw new CoolantInputError(
      field,
      `${formatFigure(celsius, 'temperature')} is not a liquid coolant temperature (about ${minCelsius} to ${maxCelsius} °C in a road vehicle); check the reading and the unit.`,
    );
  }
  return celsius;
}
