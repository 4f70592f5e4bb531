// Reads the quantities a technician types ("195 degF", "15 psi", "6 qt") into Heatpath's canonical
// units, and formats canonical values back for display. The quantities, canonical units and symbols
// are Heatpath's one table (units/quantities.ts); conversions use its one mathjs instance.
import { CoolantInputError } from './errors.js';
import { CANONICAL_UNITS, quantityInfo, unitSymbol } from './units/quantities.js';
import type { Quantity } from './units/quantities.js';
import {
  convertDifference,
  convertUnit,
  differenceInKelvin,
  isUnit,
  parseUnitText,
  unitOf,
} from './units/unit-math.js';
import type { Unit } from './units/unit-math.js';

/** A value as a plain number in canonical units, a typed string, or a mathjs Unit. */
export type QuantityInput = number | string | Unit;

/**
 * Units a calculator figure may be shown in, per quantity. The first of each list is the canonical
 * unit (checked against the quantity table below).
 */
export const DISPLAY_UNITS = {
  temperature: ['degC', 'degF', 'K'],
  temperatureDelta: ['K', 'degF'],
  pressure: ['bar', 'psi', 'kPa'],
  time: ['min', 's', 'h'],
  volume: ['L', 'qt', 'gal'],
  volumeFlow: ['L/min', 'gal/min'],
  percentage: ['%'],
  number: ['none'],
} as const satisfies Record<Quantity, readonly string[]>;

export type DisplayUnit<Q extends Quantity = Quantity> = (typeof DISPLAY_UNITS)[Q][number];

// Each canonical unit is also one of its quantity's display units.
CANONICAL_UNITS satisfies { readonly [Q in Quantity]: DisplayUnit<Q> };

export { CANONICAL_UNITS };

function wordsFor(quantity: Quantity): string {
  return quantityInfo[quantity].words;
}

// Calculator figures sit beside a unit picker, so US units are written without the "US".
const COMPACT_SYMBOLS: Partial<Record<DisplayUnit, string>> = {
  qt: 'qt',
  gal: 'gal',
  'gal/min': 'gal/min',
};

const ABSOLUTE_ZERO_CELSIUS = -273.15;
// Gauge pressure cannot fall below a perfect vacuum at standard atmosphere.
const STANDARD_ATMOSPHERE_BAR = 1.01325;

const PLAIN_NUMBER = /^[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?$/;

/**
 * Technicians write "°C", "195 F" or "psig"; mathjs reads bare C and F as coulomb and farad, and
 * knows no gauge suffix. Gauge is Heatpath's meaning of every pressure anyway.
 */
function normaliseTyped(text: string, quantity: Quantity): string {
  let t = text.trim().replace(/[−–]/g, '-');
  t = t
    .replace(/\s*(?:°|º|deg\s*)\s*([CFcf])\b/g, ' deg$1')
    .replace(/℃/g, ' degC')
    .replace(/℉/g, ' degF');
  t = t.replace(/deg([cf])\b/g, (_m, c: string) => `deg${c.toUpperCase()}`);
  if (quantity === 'temperature' || quantity === 'temperatureDelta') {
    t = t.replace(
      /^([-+]?[\d.eE+-]+)\s*([CF])$/i,
      (_m, n: string, c: string) => `${n} deg${c.toUpperCase()}`,
    );
  }
  if (quantity === 'pressure') {
    t = t.replace(/\b(psi|bar)\s*\(?g\)?$/i, (_m, u: string) => u.toLowerCase());
  }
  return t.replace(/\s+/g, ' ');
}

function parseUnit(text: string, quantity: Quantity, field: string): Unit {
  try {
    return parseUnitText(normaliseTyped(text, quantity));
  } catch {
    throw new CoolantInputError(
      field,
      `Could not read "${text}" as ${wordsFor(quantity)}. Type a number with a unit, for example ${example(quantity)}.`,
    );
  }
}

function example(quantity: Quantity): string {
  switch (quantity) {
    case 'temperature':
      return '"90 degC" or "195 degF"';
    case 'temperatureDelta':
      return '"6 K" or "10 degF"';
    case 'pressure':
      return '"1.2 bar" or "15 psi"';
    case 'volume':
      return '"6 L" or "6 qt"';
    case 'volumeFlow':
      return '"40 L/min" or "10 gal/min"';
    case 'time':
      return '"15 min"';
    case 'percentage':
      return '"50 %"';
    case 'number':
      return '"3"';
  }
}

function unitToCanonical(u: Unit, quantity: Quantity, field: string, shown: string): number {
  const canonical = CANONICAL_UNITS[quantity];
  if (u.units.length === 0 || !u.equalBase(unitOf(1, canonical))) {
    throw new CoolantInputError(
      field,
      `"${shown}" is not ${wordsFor(quantity)}; expected something like ${example(quantity)}.`,
    );
  }
  if (quantity === 'temperatureDelta') {
    // A difference has no offset: 9 °F of difference is 5 K, not −12.8 °C.
    return differenceInKelvin(u);
  }
  return u.toNumber(canonical);
}

function checkPhysical(value: number, quantity: Quantity, field: string, shown: string): number {
  if (!Number.isFinite(value)) {
    throw new CoolantInputError(field, `"${shown}" is not a finite number.`);
  }
  switch (quantity) {
    case 'temperature':
      if (value < ABSOLUTE_ZERO_CELSIUS) {
        throw new CoolantInputError(field, `"${shown}" is below absolute zero (−273.15 °C).`);
      }
      break;
    case 'pressure':
      if (value < -STANDARD_ATMOSPHERE_BAR) {
        throw new CoolantInputError(
          field,
          `"${shown}" is below a perfect vacuum (−1.01325 bar gauge); pressures are read as gauge.`,
        );
      }
      break;
    case 'volume':
    case 'volumeFlow':
    case 'time':
      if (value < 0) {
        throw new CoolantInputError(
          field,
          `"${shown}" is negative; ${wordsFor(quantity)} cannot be.`,
        );
      }
      break;
    case 'percentage':
      if (value < 0 || value > 100) {
        throw new CoolantInputError(field, `"${shown}" is outside 0–100 %.`);
      }
      break;
    case 'temperatureDelta':
    case 'number':
      break;
  }
  return value;
}

/**
 * Converts a typed or numeric value to Heatpath's canonical unit for `quantity` (°C, K for
 * differences, bar gauge, litres, L/min, minutes, percent). Plain numbers are taken as already
 * canonical. Throws CoolantInputError on unreadable text, the wrong dimension, NaN/Infinity or a
 * physically impossible value (below absolute zero, below vacuum, negative volume, percent outside
 * 0–100).
 */
export function toCanonical(
  value: QuantityInput,
  quantity: Quantity,
  field: string = quantity,
): number {
  if (typeof value === 'number') {
    return checkPhysical(value, quantity, field, String(value));
  }
  if (typeof value === 'string') {
    const text = value.trim();
    if (text === '') {
      throw new CoolantInputError(field, `Enter ${wordsFor(quantity)}.`);
    }
    if (quantity === 'percentage') {
      const bare = text.replace(/\s*%$/, '');
      if (!PLAIN_NUMBER.test(bare)) {
        throw new CoolantInputError(
          field,
          `Could not read "${text}" as a percentage, for example "50 %".`,
        );
      }
      return checkPhysical(Number(bare), quantity, field, text);
    }
    if (PLAIN_NUMBER.test(text)) {
      return checkPhysical(Number(text), quantity, field, text);
    }
    const u = parseUnit(text, quantity, field);
    return checkPhysical(unitToCanonical(u, quantity, field, text), quantity, field, text);
  }
  if (isUnit(value)) {
    if (quantity === 'percentage' || quantity === 'number') {
      throw new CoolantInputError(field, 'A percentage is a plain number, not a unit.');
    }
    const shown = value.toString();
    return checkPhysical(unitToCanonical(value, quantity, field, shown), quantity, field, shown);
  }
  throw new CoolantInputError(field, `Expected ${wordsFor(quantity)}.`);
}

/** Converts a canonical value to one of the display units offered for its quantity. */
export function fromCanonical<Q extends Quantity>(
  value: number,
  quantity: Q,
  unit: DisplayUnit<Q>,
): number {
  const canonical = CANONICAL_UNITS[quantity];
  if (unit === canonical || quantity === 'percentage' || quantity === 'number') {
    return value;
  }
  if (quantity === 'temperatureDelta') {
    return convertDifference(value, 'K', unit);
  }
  return convertUnit(value, canonical, unit);
}

export interface FormatOptions<Q extends Quantity> {
  /** Display unit; defaults to the canonical one. */
  readonly unit?: DisplayUnit<Q>;
  /** Digits after the decimal point; defaults to 1. */
  readonly digits?: number;
}

/** Formats a canonical value for display, e.g. formatQuantity(90.5, 'temperature', { unit: 'degF' }) → "194.9 °F". */
export function formatQuantity<Q extends Quantity>(
  value: number,
  quantity: Q,
  options: FormatOptions<Q> = {},
): string {
  const unit = options.unit ?? CANONICAL_UNITS[quantity];
  const digits = options.digits ?? 1;
  const shown = fromCanonical(value, quantity, unit);
  const symbol = COMPACT_SYMBOLS[unit] ?? unitSymbol(unit);
  const number = Object.is(Number(shown.toFixed(digits)), -0)
    ? (0).toFixed(digits)
    : shown.toFixed(digits);
  if (symbol === '') return number;
  return symbol === '%' ? `${number} %` : `${number} ${symbol}`;
}
