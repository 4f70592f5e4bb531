// Finds how a log is laid out from its first lines: the delimiter, the decimal mark, and which
// lines are a preamble, the header and a line of units above the readings. The rules are
// deterministic so the same export always reads the same way (and gets the same signature).
import Papa from 'papaparse';
import { TemperatureLogError } from '../errors.js';
import { decimalMarkOf, looksNumeric } from './number-value.js';
import type { DecimalMark } from './number-value.js';
import { timeShapeOf } from './time-value.js';

export type Delimiter = ',' | ';' | '\t';

// Tab and semicolon first: a semicolon file with decimal commas also splits evenly on commas.
const DELIMITERS: readonly Delimiter[] = ['\t', ';', ','];
/** Lines looked at to decide the layout. */
export const SAMPLE_LINES = 60;
// Share of the sample that must have the common column count (the rest: preamble, header).
const CONSISTENT_SHARE = 0.6;

const UNIT_CELL =
  /^[[(]?\s*(?:°\s*[cf]|deg\s*[cf]|[cf]|°|%|s|sec|ms|min|h|hh:mm:ss|mm:ss|rpm|1\/min|km\/h|kph|mph|v|kpa|bar|psi|-)\s*[\])]?$/i;

export interface SampleLine {
  readonly text: string;
  readonly line: number;
}

export interface LogLayout {
  readonly delimiter: Delimiter;
  readonly decimal: DecimalMark | null;
  readonly columnCount: number;
  readonly headerLine: number | null;
  readonly unitLine: number | null;
  /** Non-blank lines above the header (or above the readings when there is no header). */
  readonly preambleLines: number;
  readonly firstDataLine: number;
  /** Per column: the header text, with the units line's text after it; null without a header. */
  readonly headers: readonly (string | null)[];
  /** The readings among the sampled lines, split into fields. */
  readonly sampleRows: readonly SampleRow[];
}

export interface SampleRow {
  readonly cells: readonly string[];
  readonly line: number;
}

export function splitLine(text: string, delimiter: Delimiter): string[] {
  const parsed = Papa.parse<string[]>(text, { delimiter, newline: '\n', skipEmptyLines: false });
  return parsed.data[0] ?? [''];
}

function trimmedCount(cells: readonly string[]): number {
  let n = cells.length;
  while (n > 0 && (cells[n - 1] ?? '').trim() === '') {
    n -= 1;
  }
  return n;
}

function isValueCell(cell: string): boolean {
  return timeShapeOf(cell) !== null || looksNumeric(cell);
}

function modeOf(values: readonly number[]): number {
  const counts = new Map<number, number>();
  let best = 0;
  let bestCount = 0;
  for (const v of values) {
    const c = (counts.get(v) ?? 0) + 1;
    counts.set(v, c);
    if (c > bestCount || (c === bestCount && v > best)) {
      best = v;
      bestCount = c;
    }
  }
  return best;
}

interface DelimiterTrial {
  readonly delimiter: Delimiter;
  readonly rows: string[][];
  readonly columnCount: number;
  readonly consistentShare: number;
  readonly valueShare: number;
}

function tryDelimiter(lines: readonly SampleLine[], delimiter: Delimiter): DelimiterTrial {
  const rows = lines.map((l) => splitLine(l.text, delimiter));
  const columnCount = modeOf(rows.map((r) => r.length));
  const consistent = rows.filter((r) => r.length === columnCount);
  let values = 0;
  let cells = 0;
  for (const row of consistent) {
    for (const cell of row) {
      if (cell.trim() !== '') {
        cells += 1;
        values += isValueCell(cell) ? 1 : 0;
      }
    }
  }
  return {
    delimiter,
    rows,
    columnCount,
    consistentShare: consistent.length / rows.length,
    valueShare: cells === 0 ? 0 : values / cells,
  };
}

function isDataRow(row: readonly string[], columnCount: number): boolean {
  if (row.length !== columnCount) {
    return false;
  }
  const filled = row.filter((c) => c.trim() !== '');
  const values = filled.filter(isValueCell).length;
  return values > 0 && values * 2 >= filled.length;
}

function isUnitRow(row: readonly string[]): boolean {
  const filled = row.map((c) => c.trim()).filter((c) => c !== '');
  return filled.length > 0 && filled.every((c) => UNIT_CELL.test(c));
}

function detectDecimal(rows: readonly SampleRow[]): DecimalMark | null {
  let commas = 0;
  let points = 0;
  for (const row of rows) {
    for (const cell of row.cells) {
      const mark = decimalMarkOf(cell);
      if (mark === ',') {
        commas += 1;
      } else if (mark === '.') {
        points += 1;
      }
    }
  }
  if (commas === 0 && points === 0) {
    return null;
  }
  return commas > points ? ',' : '.';
}

function chooseDelimiter(lines: readonly SampleLine[]): DelimiterTrial {
  const trials = DELIMITERS.map((d) => tryDelimiter(lines, d));
  const usable = trials.filter((t) => t.columnCount >= 2 && t.consistentShare >= CONSISTENT_SHARE);
  const first = lines[0];
  if (usable.length === 0) {
    if (trials.every((t) => t.columnCount < 2)) {
      throw new TemperatureLogError(
        'single-column',
        'the file has one column. Heatpath needs at least a time and a coolant temperature, separated by commas, semicolons or tabs.',
        { line: first?.line ?? 1 },
      );
    }
    // Name the first line that breaks the most common pattern of the most promising delimiter.
    const best = trials
      .filter((t) => t.columnCount >= 2)
      .reduce((a, b) => (b.consistentShare > a.consistentShare ? b : a));
    const at = Math.max(
      0,
      best.rows.findIndex((r) => r.length !== best.columnCount),
    );
    const count = best.rows[at]?.length ?? 0;
    throw new TemperatureLogError(
      'inconsistent-columns',
      `this line has ${count} column${count === 1 ? '' : 's'} where other lines have ${best.columnCount}; Heatpath could not tell how the columns are separated.`,
      { line: lines[at]?.line ?? 1 },
    );
  }
  // Most values readable wins; on a tie the order of DELIMITERS decides.
  return usable.reduce((best, t) => (t.valueShare > best.valueShare + 1e-9 ? t : best));
}

/** Decides the layout from the first non-blank lines of the file (at most SAMPLE_LINES). */
export function detectLayout(lines: readonly SampleLine[]): LogLayout {
  const trial = chooseDelimiter(lines);
  const { rows, columnCount } = trial;
  const dataStart = rows.findIndex((r) => isDataRow(r, columnCount));
  if (dataStart === -1) {
    throw new TemperatureLogError(
      'no-readings',
      `none of the first ${lines.length} lines holds readings (numbers or times in most of its columns).`,
      { line: lines[0]?.line ?? 1 },
    );
  }
  const heading = rows.slice(0, dataStart);
  let headerIndex: number | null = null;
  let unitIndex: number | null = null;
  if (heading.length > 0) {
    const last = heading.length - 1;
    const lastRow = heading[last] ?? [];
    if (heading.length >= 2 && isUnitRow(lastRow) && trimmedCount(heading[last - 1] ?? []) >= 2) {
      unitIndex = last;
      headerIndex = last - 1;
    } else if (trimmedCount(lastRow) >= 2) {
      headerIndex = last;
    }
  }
  const headerRow = headerIndex === null ? null : (rows[headerIndex] ?? null);
  const unitRow = unitIndex === null ? null : (rows[unitIndex] ?? null);
  const headers = Array.from({ length: columnCount }, (_, i) => {
    if (headerRow === null) {
      return null;
    }
    const name = (headerRow[i] ?? '').trim();
    const unit = (unitRow?.[i] ?? '').trim();
    return unit === '' ? name : `${name} ${unit}`.trim();
  });
  const sampleRows = rows
    .map((cells, i) => ({ cells, line: lines[i]?.line ?? 0 }))
    .slice(dataStart)
    .filter((r) => r.cells.length === columnCount);
  const lineAt = (index: number | null): number | null =>
    index === null ? null : (lines[index]?.line ?? null);
  return {
    delimiter: trial.delimiter,
    decimal: detectDecimal(sampleRows),
    columnCount,
    headerLine: lineAt(headerIndex),
    unitLine: lineAt(unitIndex),
    preambleLines: headerIndex ?? dataStart,
    firstDataLine: lines[dataStart]?.line ?? 1,
    headers,
    sampleRows,
  };
}
