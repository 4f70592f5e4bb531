// Turns the person's remembered unit choices into the coolant package's display units, and a
// typed box into the text the package reads. Conversion itself is the package's (mathjs), never
// done by hand here.
import type { UnitPreferences } from '@heatpath/contracts';
import type { DisplayUnit } from '@heatpath/coolant';

export interface DisplayUnits {
  temperature: DisplayUnit<'temperature'>;
  temperatureDifference: DisplayUnit<'temperatureDelta'>;
  pressure: DisplayUnit<'pressure'>;
  volume: DisplayUnit<'volume'>;
  volumeFlow: DisplayUnit<'volumeFlow'>;
}

export function displayUnits(preferences: UnitPreferences): DisplayUnits {
  const fahrenheit = preferences.temperature === 'F';
  const quarts = preferences.volume === 'qt';
  return {
    temperature: fahrenheit ? 'degF' : 'degC',
    temperatureDifference: fahrenheit ? 'degF' : 'K',
    pressure: preferences.pressure === 'psi' ? 'psi' : 'bar',
    volume: quarts ? 'qt' : 'L',
    // US practice gives coolant flow in gallons a minute; quarts a minute is not a unit in use.
    volumeFlow: quarts ? 'gal/min' : 'L/min',
  };
}

const symbols: Record<string, string> = {
  degC: '°C',
  degF: '°F',
  K: 'K',
  bar: 'bar',
  psi: 'psi',
  L: 'L',
  qt: 'US qt',
  'L/min': 'L/min',
  'gal/min': 'US gal/min',
};

export function unitSymbol(unit: string): string {
  return symbols[unit] ?? unit;
}

const plainNumber = /^[-+−]?(?:\d+(?:[.,]\d*)?|[.,]\d+)$/;

/**
 * What to hand the coolant package for a typed box: a bare number gets the unit shown beside the
 * box; anything else ("195 F", "15 psi") is passed as typed, so a person may type their own unit.
 * A decimal comma is read as a point, as many workshop phones type it.
 */
export function quantityText(typed: string, unit: string): string {
  const text = typed.trim();
  if (plainNumber.test(text)) return `${text.replace(',', '.').replace('−', '-')} ${unit}`;
  return text;
}

/** A percentage box: a bare number with an optional "%"; decimal comma allowed. */
export function percentText(typed: string): string {
  const text = typed.trim().replace('−', '-');
  return /^[-+]?\d+,\d+\s*%?$/.test(text) ? text.replace(',', '.') : text;
}

/** Shows negative figures with a true minus sign, which reads better at arm's length. */
export function withMinus(text: string): string {
  return text.replace(/^-/, '−');
}
