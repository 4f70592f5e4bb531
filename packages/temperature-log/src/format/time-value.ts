// The time formats Heatpath reads in a log's time column, and how each becomes seconds. Clock
// times and timestamps become seconds from the first reading later; here each value is read on
// its own. Timestamps without a zone are read as UTC so the result never depends on the
// server's zone: only differences between readings are used.

export type TimeFormat = 'seconds' | 'milliseconds' | 'minutes' | 'mm:ss' | 'hh:mm:ss' | 'iso';

const MM_SS = /^(\d+):([0-5]?\d(?:[.,]\d+)?)$/;
const HH_MM_SS = /^(\d+):([0-5]\d):([0-5]\d(?:[.,]\d+)?)$/;
const ISO =
  /^(\d{4})-(\d{2})-(\d{2})[T ](\d{2}):(\d{2})(?::(\d{2})(?:[.,](\d+))?)?\s*(Z|[+-]\d{2}(?::?\d{2})?)?$/i;
const PLAIN = /^[+-]?(?:\d+(?:[.,]\d*)?|[.,]\d+)$/;

function decimal(text: string): number {
  return Number(text.replace(',', '.'));
}

function isoSeconds(text: string): number {
  const m = ISO.exec(text);
  if (m === null) {
    return Number.NaN;
  }
  const [, y, mo, d, h, mi, s, frac, zone] = m;
  const month = Number(mo);
  const day = Number(d);
  const hour = Number(h);
  const minute = Number(mi);
  const second = s === undefined ? 0 : Number(s);
  if (month < 1 || month > 12 || day < 1 || day > 31 || hour > 23 || minute > 59 || second > 60) {
    return Number.NaN;
  }
  let ms = Date.UTC(Number(y), month - 1, day, hour, minute, second);
  if (frac !== undefined) {
    ms += Number(`0.${frac}`) * 1000;
  }
  if (zone !== undefined && zone.toUpperCase() !== 'Z') {
    const sign = zone.startsWith('-') ? -1 : 1;
    const digits = zone.slice(1).replace(':', '');
    const offsetMinutes = Number(digits.slice(0, 2)) * 60 + Number(digits.slice(2) || '0');
    ms -= sign * offsetMinutes * 60_000;
  }
  return ms / 1000;
}

/** Reads one time value in `format` as seconds (NaN when it is not in that format). */
export function readTime(text: string, format: TimeFormat): number {
  switch (format) {
    case 'seconds':
      return PLAIN.test(text) ? decimal(text) : Number.NaN;
    case 'milliseconds':
      return PLAIN.test(text) ? decimal(text) / 1000 : Number.NaN;
    case 'minutes':
      return PLAIN.test(text) ? decimal(text) * 60 : Number.NaN;
    case 'mm:ss': {
      const m = MM_SS.exec(text);
      return m === null ? Number.NaN : Number(m[1]) * 60 + decimal(m[2] ?? '');
    }
    case 'hh:mm:ss': {
      const m = HH_MM_SS.exec(text);
      return m === null
        ? Number.NaN
        : Number(m[1]) * 3600 + Number(m[2]) * 60 + decimal(m[3] ?? '');
    }
    case 'iso':
      return isoSeconds(text);
  }
}

/** The shape of one value: which family of formats it can belong to. */
export function timeShapeOf(text: string): 'iso' | 'hh:mm:ss' | 'mm:ss' | 'plain' | null {
  const t = text.trim();
  if (ISO.test(t)) {
    return 'iso';
  }
  if (HH_MM_SS.test(t)) {
    return 'hh:mm:ss';
  }
  if (MM_SS.test(t)) {
    return 'mm:ss';
  }
  if (PLAIN.test(t)) {
    return 'plain';
  }
  return null;
}

/**
 * The format most of the sample values share (at least half of them), or null. Plain numbers are
 * seconds unless the header names another unit (`plainUnit`). A minority in another shape does
 * not change the format: the reader then refuses those lines with their line numbers.
 */
export function detectTimeFormat(
  samples: readonly string[],
  plainUnit: 'seconds' | 'milliseconds' | 'minutes' = 'seconds',
): TimeFormat | null {
  const values = samples.map((s) => s.trim()).filter((s) => s !== '');
  const counts = new Map<ReturnType<typeof timeShapeOf>, number>();
  for (const v of values) {
    const shape = timeShapeOf(v);
    counts.set(shape, (counts.get(shape) ?? 0) + 1);
  }
  let best: ReturnType<typeof timeShapeOf> = null;
  let bestCount = 0;
  for (const [shape, count] of counts) {
    if (shape !== null && count > bestCount) {
      best = shape;
      bestCount = count;
    }
  }
  if (best === null || bestCount * 2 < values.length) {
    return null;
  }
  return best === 'plain' ? plainUnit : best;
}

/** How a format is named in messages. */
export function describeTimeFormat(format: TimeFormat): string {
  switch (format) {
    case 'seconds':
      return 'seconds';
    case 'milliseconds':
      return 'milliseconds';
    case 'minutes':
      return 'minutes';
    case 'mm:ss':
      return 'minutes and seconds (mm:ss)';
    case 'hh:mm:ss':
      return 'hours, minutes and seconds (hh:mm:ss)';
    case 'iso':
      return 'date and time (2024-05-01T10:15:30)';
  }
}
