// Units a header states for its column. Only what the header says is taken: a temperature
// column whose header is silent leaves the unit to the person, because 90 could be either.
import type { TimeFormat } from '../format/time-value.js';

export type TemperatureUnit = 'degC' | 'degF';
export type SpeedUnit = 'km/h' | 'mph';

const FAHRENHEIT = ['°f', 'degf', 'fahrenheit', 'f'];
const CELSIUS = ['°c', 'degc', 'celsius', 'c'];

/** °C or °F when the header says so ("Coolant (°F)", "ECT_F", "coolant temp degF"), else null. */
export function statedTemperatureUnit(words: readonly string[]): TemperatureUnit | null {
  // "deg F" arrives as two words; the lone letter is enough.
  const fahrenheit = words.some((w) => FAHRENHEIT.includes(w));
  const celsius = words.some((w) => CELSIUS.includes(w));
  if (fahrenheit === celsius) {
    return null;
  }
  return fahrenheit ? 'degF' : 'degC';
}

/** km/h or mph when the header says so, else null. */
export function statedSpeedUnit(words: readonly string[]): SpeedUnit | null {
  if (words.includes('mph')) {
    return 'mph';
  }
  if (words.some((w) => w === 'km/h' || w === 'kph' || w === 'kmh')) {
    return 'km/h';
  }
  return null;
}

/** The unit of plain-number times the header names ("Time (ms)", "elapsed min"), else seconds. */
export function statedPlainTimeUnit(
  words: readonly string[],
): Extract<TimeFormat, 'seconds' | 'milliseconds' | 'minutes'> {
  if (words.some((w) => w === 'ms' || w === 'msec' || w === 'millis' || w === 'milliseconds')) {
    return 'milliseconds';
  }
  if (words.some((w) => w === 'min' || w === 'mins' || w === 'minutes')) {
    return 'minutes';
  }
  return 'seconds';
}
