// Writes a series as a text export in any of the layouts the reader accepts, so tests and the
// benchmark can check the parser on every format with data whose values are known. Header
// names are Heatpath's own invention, not any scan tool's.
import type { TemperatureUnit } from '../columns/stated-units.js';
import { applyMap } from '@heatpath/coolant';
import { celsiusTo } from '../units/unit-conversion.js';

export interface CsvLayout {
  readonly delimiter?: ',' | ';' | '\t';
  readonly decimal?: '.' | ',';
  readonly header?: boolean;
  /** Write the unit in the header ("Coolant temperature (°F)"); default true. */
  readonly unitInHeader?: boolean;
  readonly timeFormat?: 'seconds' | 'milliseconds' | 'mm:ss' | 'hh:mm:ss' | 'iso';
  readonly unit?: TemperatureUnit;
  readonly newline?: '\n' | '\r\n';
  /** Clock time of the first reading for hh:mm:ss and ISO, as an ISO timestamp (UTC). */
  readonly startIso?: string;
  /** Digits after the decimal mark; default 2. */
  readonly digits?: number;
}

export interface CsvSeries {
  readonly times: readonly number[];
  readonly coolantC: readonly number[];
  readonly fanDuty?: readonly (number | null)[] | null;
  readonly ambientC?: readonly (number | null)[] | null;
}

function pad(n: number, width = 2): string {
  return String(n).padStart(width, '0');
}

// Seconds with a tenth when the reading falls between whole seconds ("07.5").
function seconds(s: number): string {
  return Number.isInteger(s) ? pad(s) : s.toFixed(1).padStart(4, '0');
}

function formatTime(t: number, layout: Required<CsvLayout>): string {
  switch (layout.timeFormat) {
    case 'seconds':
      return Number.isInteger(t) ? String(t) : t.toFixed(1);
    case 'milliseconds':
      return String(Math.round(t * 1000));
    case 'mm:ss': {
      const minutes = Math.floor(t / 60);
      return `${pad(minutes)}:${seconds(Math.round((t - minutes * 60) * 10) / 10)}`;
    }
    case 'hh:mm:ss': {
      const clock = new Date(Date.parse(layout.startIso) + Math.round(t * 1000));
      const s = clock.getUTCSeconds() + Math.round(clock.getUTCMilliseconds() / 100) / 10;
      return `${pad(clock.getUTCHours())}:${pad(clock.getUTCMinutes())}:${seconds(s)}`;
    }
    case 'iso':
      return new Date(Date.parse(layout.startIso) + t * 1000).toISOString().replace('.000Z', 'Z');
  }
}

export function logCsv(series: CsvSeries, options: CsvLayout = {}): string {
  const layout: Required<CsvLayout> = {
    delimiter: options.delimiter ?? ',',
    decimal: options.decimal ?? '.',
    header: options.header ?? true,
    unitInHeader: options.unitInHeader ?? true,
    timeFormat: options.timeFormat ?? 'seconds',
    unit: options.unit ?? 'degC',
    newline: options.newline ?? '\n',
    startIso: options.startIso ?? '2024-05-01T10:00:00Z',
    digits: options.digits ?? 2,
  };
  const toUnit = celsiusTo(layout.unit);
  const unitText = layout.unitInHeader ? (layout.unit === 'degC' ? ' (°C)' : ' (°F)') : '';
  const quoteCommas = layout.decimal === ',' && layout.delimiter === ',';
  const num = (v: number | null | undefined): string => {
    if (v === null || v === undefined) {
      return '';
    }
    const text = v.toFixed(layout.digits);
    if (layout.decimal === '.') {
      return text;
    }
    const comma = text.replace('.', ',');
    return quoteCommas ? `"${comma}"` : comma;
  };
  const temperature = (v: number | null | undefined): string =>
    num(v === null || v === undefined ? v : applyMap(toUnit, v));

  const timeHeader = layout.timeFormat === 'milliseconds' ? 'Elapsed time (ms)' : 'Elapsed time';
  const headers = [timeHeader, `Coolant temperature${unitText}`];
  if (series.ambientC) {
    headers.push(`Ambient air${unitText}`);
  }
  if (series.fanDuty) {
    headers.push('Fan duty (%)');
  }
  const lines: string[] = layout.header ? [headers.join(layout.delimiter)] : [];
  for (let i = 0; i < series.times.length; i += 1) {
    const cells = [formatTime(series.times[i] ?? 0, layout), temperature(series.coolantC[i])];
    if (series.ambientC) {
      cells.push(temperature(series.ambientC[i]));
    }
    if (series.fanDuty) {
      cells.push(num(series.fanDuty[i]));
    }
    lines.push(cells.join(layout.delimiter));
  }
  return lines.join(layout.newline) + layout.newline;
}
