// Reads the readings, piece by piece, into the series arrays, checking every value on the way.
// The first problem ends the read with its line; nothing read so far is handed out, so a caller
// gets a complete series or an error, never part of a file.
import Papa from 'papaparse';
import { TemperatureLogError } from '../errors.js';
import { readNumber } from '../format/number-value.js';
import { describeTimeFormat, readTime } from '../format/time-value.js';
import type { LinePiece } from '../input/line-pieces.js';
import type { TemperatureSeries } from '../series/temperature-series.js';
import { applyMap } from '@heatpath/coolant';
import type { ChannelKey, ColumnPlan, ReadingPlan } from './reading-plan.js';

const DAY_SECONDS = 24 * 3600;

export interface RowLimits {
  readonly minRows: number;
  readonly maxRows: number;
}

function formatNumber(value: number): string {
  return String(Math.round(value * 10) / 10);
}

export class RowReader {
  private readonly plan: ReadingPlan;
  private readonly limits: RowLimits;
  private readonly times: number[] = [];
  private readonly coolantC: number[] = [];
  private readonly channels: (number | null)[][];
  private firstTime = Number.NaN;
  private lastTime = Number.NEGATIVE_INFINITY;
  private lastTimeText = '';
  private dayOffset = 0;
  private startedAt: string | null = null;
  private skipped = 0;

  constructor(plan: ReadingPlan, limits: RowLimits) {
    this.plan = plan;
    this.limits = limits;
    this.channels = plan.channels.map(() => []);
  }

  readPiece(piece: LinePiece): void {
    const parsed = Papa.parse<string[]>(piece.text, {
      delimiter: this.plan.layout.delimiter,
      newline: '\n',
      skipEmptyLines: false,
    });
    const [problem] = parsed.errors;
    if (problem !== undefined) {
      throw new TemperatureLogError(
        'bad-quotes',
        `a quoted value is not closed on its line (${problem.message.toLowerCase()}).`,
        { line: piece.firstLine + (problem.row ?? 0) },
      );
    }
    const rows = parsed.data;
    if (rows.length !== piece.lineCount) {
      // A quoted value ran over a line break: name the line it started on.
      const at = rows.findIndex((r) => r.some((cell) => cell.includes('\n')));
      throw new TemperatureLogError(
        'bad-quotes',
        'a quoted value runs over more than one line; Heatpath reads one reading per line.',
        { line: piece.firstLine + Math.max(0, at) },
      );
    }
    const firstData = this.plan.layout.firstDataLine;
    for (let i = 0; i < rows.length; i += 1) {
      const line = piece.firstLine + i;
      if (line < firstData) {
        continue;
      }
      this.readRow(rows[i] ?? [], line);
    }
  }

  private readRow(cells: readonly string[], line: number): void {
    if (cells.every((c) => c.trim() === '')) {
      return;
    }
    const plan = this.plan;
    if (cells.length < plan.minCells) {
      throw new TemperatureLogError(
        'short-row',
        `this line has ${cells.length} column${cells.length === 1 ? '' : 's'}, but the mapping reads up to column ${plan.minCells}.`,
        { line },
      );
    }
    const coolantText = (cells[plan.coolant.index] ?? '').trim();
    if (coolantText === '') {
      this.skipped += 1;
      return;
    }
    const time = this.readTimeCell(cells, line);
    const coolant = this.readValue(plan.coolant, coolantText, line);
    if (this.times.length >= this.limits.maxRows) {
      throw new TemperatureLogError(
        'too-many-rows',
        `the log has more than ${this.limits.maxRows.toLocaleString('en')} readings, more than Heatpath reads from one file; split the log.`,
        { line },
      );
    }
    this.times.push(time);
    this.coolantC.push(coolant);
    for (let k = 0; k < plan.channels.length; k += 1) {
      const channel = plan.channels[k];
      const values = this.channels[k];
      if (channel === undefined || values === undefined) {
        continue;
      }
      const text = (cells[channel.index] ?? '').trim();
      values.push(text === '' ? null : this.readValue(channel, text, line));
    }
  }

  private readTimeCell(cells: readonly string[], line: number): number {
    const plan = this.plan;
    const text = (cells[plan.time.index] ?? '').trim();
    if (text === '') {
      throw new TemperatureLogError(
        'missing-value',
        `${plan.time.name} is empty; every reading needs its time.`,
        {
          line,
          column: plan.time.index,
        },
      );
    }
    let t = readTime(text, plan.timeFormat);
    if (Number.isNaN(t)) {
      throw new TemperatureLogError(
        'bad-time',
        `${plan.time.name}: "${text}" is not a time in ${describeTimeFormat(plan.timeFormat)}, the format of this file's first readings.`,
        { line, column: plan.time.index },
      );
    }
    t += this.dayOffset;
    // A clock log that runs past midnight: 23:59:58 then 00:00:01 is three seconds later.
    if (plan.timeFormat === 'hh:mm:ss' && this.lastTime - t > DAY_SECONDS / 2) {
      this.dayOffset += DAY_SECONDS;
      t += DAY_SECONDS;
    }
    if (t < this.lastTime) {
      throw new TemperatureLogError(
        'time-backwards',
        `the time goes backwards: ${plan.time.name} reads "${text}" after "${this.lastTimeText}" on the reading before.`,
        { line, column: plan.time.index },
      );
    }
    if (Number.isNaN(this.firstTime)) {
      this.firstTime = t;
      this.startedAt = plan.timeFormat === 'hh:mm:ss' || plan.timeFormat === 'iso' ? text : null;
    }
    this.lastTime = t;
    this.lastTimeText = text;
    return t - this.firstTime;
  }

  private readValue(column: ColumnPlan, text: string, line: number): number {
    const reading = readNumber(text, this.plan.layout.decimal);
    if (!reading.ok) {
      const why = reading.wrongMark
        ? `uses a decimal ${this.plan.layout.decimal === ',' ? 'point' : 'comma'}, but the rest of the file uses a decimal ${this.plan.layout.decimal === ',' ? 'comma' : 'point'}`
        : 'is not a number';
      throw new TemperatureLogError(
        'not-a-number',
        `${column.name}: the ${column.label} "${text}" ${why}.`,
        { line, column: column.index },
      );
    }
    const value = applyMap(column.map, reading.value);
    const { min, max, unit } = column.bounds;
    if (!(value >= min && value <= max)) {
      const withUnit = (v: string, u: string): string => (u === '' ? v : `${v} ${u}`);
      const converted = column.map.scale !== 1 || column.map.offset !== 0;
      const shown = converted
        ? `${withUnit(text, column.fileUnit)} (${withUnit(formatNumber(value), unit)})`
        : withUnit(text, unit);
      throw new TemperatureLogError(
        'out-of-range',
        `${column.name}: the ${column.label} ${shown} is outside ${withUnit(`${min} to ${max}`, unit)}, the range Heatpath accepts. Check the column mapping and the unit.`,
        { line, column: column.index },
      );
    }
    return value;
  }

  /** The complete series, or the error that the file holds too little to analyse. */
  finish(lastLine: number): Omit<TemperatureSeries, 'sourceSignature' | 'mapping' | 'detected'> {
    const rows = this.times.length;
    if (rows < this.limits.minRows) {
      throw new TemperatureLogError(
        'too-few-rows',
        `the log ends here after ${rows} reading${rows === 1 ? '' : 's'}; Heatpath needs at least ${this.limits.minRows} to analyse a log.`,
        { line: lastLine },
      );
    }
    if (this.lastTime - this.firstTime <= 0) {
      throw new TemperatureLogError(
        'no-time-span',
        'every reading has the same time, so the log covers no time at all.',
        { line: lastLine },
      );
    }
    const channel = (key: ChannelKey): (number | null)[] | null => {
      const at = this.plan.channels.findIndex((c) => c.key === key);
      return at === -1 ? null : (this.channels[at] ?? null);
    };
    return {
      times: this.times,
      coolantC: this.coolantC,
      intakeAirC: channel('intakeAirC'),
      ambientC: channel('ambientC'),
      vehicleSpeedKph: channel('vehicleSpeedKph'),
      engineSpeedRpm: channel('engineSpeedRpm'),
      fanDuty: channel('fanDuty'),
      rows,
      skippedRows: this.skipped,
      startedAt: this.startedAt,
    };
  }
}
