// How a number typed at the car is read, the one rule for every box in the web app: the walk's
// readings, the tree editor's ranges and samples, findings' quantities and hours.

// Digits with one optional decimal point or comma and an optional sign; no exponents, no hex,
// no "Infinity", so only what a person means as a plain figure is taken.
const plainNumber = /^[-+−]?(?:\d+(?:[.,]\d*)?|[.,]\d+)$/;

/**
 * A typed number: null while the box is empty, NaN when the text is not a plain number.
 * A decimal comma and a true minus sign (−) are read as many phones type them.
 */
export function readNumber(typed: string): number | null {
  const text = typed.trim();
  if (text === '') return null;
  if (!plainNumber.test(text)) return Number.NaN;
  return Number(text.replace(',', '.').replace('−', '-'));
}

/** A typed number, or undefined when the box is empty or holds something else. */
export function readOptionalNumber(typed: string): number | undefined {
  const value = readNumber(typed);
  return value === null || Number.isNaN(value) ? undefined : value;
}
