// Reads one number as loggers write it: decimal point or decimal comma, no thousands separators
// (a logger writes 1500 rpm, not 1,500). Which mark a file uses is decided from its first lines;
// a value with the other mark is refused rather than read a thousand times too small or large.

export type DecimalMark = '.' | ',';

const POINT_NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;
const COMMA_NUMBER = /^[+-]?(?:\d+(?:,\d*)?|,\d+)(?:[eE][+-]?\d+)?$/;
const HAS_COMMA_DECIMAL = /^[+-]?\d*,\d+(?:[eE][+-]?\d+)?$/;
const HAS_POINT_DECIMAL = /^[+-]?\d*\.\d+(?:[eE][+-]?\d+)?$/;

/** Whether the text is a number with either decimal mark. */
export function looksNumeric(text: string): boolean {
  const t = text.trim();
  return POINT_NUMBER.test(t) || COMMA_NUMBER.test(t);
}

/** The decimal mark a value shows, or null for a whole number. */
export function decimalMarkOf(text: string): DecimalMark | null {
  const t = text.trim();
  if (HAS_COMMA_DECIMAL.test(t)) {
    return ',';
  }
  if (HAS_POINT_DECIMAL.test(t)) {
    return '.';
  }
  return null;
}

export type NumberReading =
  | { readonly ok: true; readonly value: number }
  | { readonly ok: false; readonly wrongMark: boolean };

/**
 * Reads `text` (already trimmed, not empty). `decimal` is the file's mark, or null when its first
 * lines showed whole numbers only, in which case either mark is taken.
 */
export function readNumber(text: string, decimal: DecimalMark | null): NumberReading {
  if (decimal !== ',' && POINT_NUMBER.test(text)) {
    return { ok: true, value: Number(text) };
  }
  if (decimal !== '.' && COMMA_NUMBER.test(text)) {
    return { ok: true, value: Number(text.replace(',', '.')) };
  }
  const wrongMark =
    (decimal === ',' && POINT_NUMBER.test(text)) || (decimal === '.' && COMMA_NUMBER.test(text));
  return { ok: false, wrongMark };
}
