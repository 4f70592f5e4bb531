// How the logs screen writes times and temperatures: minutes and seconds for durations and the
// chart's axis, and temperatures in the person's unit. Conversions come from the fault-tree
// package (mathjs); the chart's thousands of points use the straight line it gives for °C → °F,
// worked out once, rather than a mathjs call per point.
import type { UnitPreferences } from '@heatpath/contracts';
import { formatNumber, fromCanonical, toCanonical, unitSymbol } from '@heatpath/fault-tree';

export type TemperatureUnitCode = 'degC' | 'degF';

export interface TemperatureDisplay {
  unit: TemperatureUnitCode;
  symbol: string;
  /** °C → the shown unit. */
  fromC: (celsius: number) => number;
  /** The shown unit → °C. */
  toC: (shown: number) => number;
  /** "88.4 °C" */
  format: (celsius: number, decimals?: number) => string;
  /** A difference or a swing: "6 K" or "10.8 °F". */
  formatDelta: (kelvin: number, decimals?: number) => string;
  /** A rate of rise: "4.2 K/min" or "7.6 °F/min". */
  formatRate: (kelvinPerMinute: number) => string;
}

export function temperatureDisplay(preferences: UnitPreferences): TemperatureDisplay {
  const unit: TemperatureUnitCode = preferences.temperature === 'F' ? 'degF' : 'degC';
  const offset = fromCanonical(0, unit, 'temperature');
  const slope = (fromCanonical(100, unit, 'temperature') - offset) / 100;
  const symbol = unitSymbol(unit);
  const deltaSymbol = unit === 'degF' ? '°F' : 'K';
  const delta = (kelvin: number) =>
    unit === 'degF' ? fromCanonical(kelvin, 'degF', 'temperatureDelta') : kelvin;
  return {
    unit,
    symbol,
    fromC: (celsius) => celsius * slope + offset,
    toC: (shown) => toCanonical(shown, unit, 'temperature'),
    format: (celsius, decimals = 1) =>
      `${minus(formatNumber(celsius * slope + offset, decimals))} ${symbol}`,
    formatDelta: (kelvin, decimals = 1) =>
      `${minus(formatNumber(delta(kelvin), decimals))} ${deltaSymbol}`,
    formatRate: (rate) => `${minus(formatNumber(delta(rate), 1))} ${deltaSymbol}/min`,
  };
}

function minus(text: string): string {
  return text.replace(/^-/, '−');
}

const pad = (n: number) => String(n).padStart(2, '0');

/** A moment of the log on the chart's axis: "12:05" (min:s) or "1:12:05" (h:min:s). */
export function formatClock(seconds: number): string {
  const whole = Math.max(0, Math.round(seconds));
  const h = Math.floor(whole / 3600);
  const m = Math.floor((whole % 3600) / 60);
  const s = whole % 60;
  return h > 0 ? `${h}:${pad(m)}:${pad(s)}` : `${m}:${pad(s)}`;
}

/** A length of time in words: "45 s", "12 min 30 s", "1 h 5 min". */
export function formatDuration(seconds: number): string {
  const whole = Math.max(0, Math.round(seconds));
  if (whole < 60) return `${whole} s`;
  const h = Math.floor(whole / 3600);
  const m = Math.floor((whole % 3600) / 60);
  const s = whole % 60;
  if (h > 0) return m > 0 ? `${h} h ${m} min` : `${h} h`;
  return s > 0 ? `${m} min ${s} s` : `${m} min`;
}

/** "at 14:32 into the log" */
export function atMoment(seconds: number): string {
  return `at ${formatClock(seconds)} into the log`;
}

export function formatBytes(bytes: number): string {
  if (bytes < 1024) return `${bytes} bytes`;
  if (bytes < 1024 * 1024) return `${formatNumber(bytes / 1024, 0)} KB`;
  return `${formatNumber(bytes / 1024 / 1024, 1)} MB`;
}
