// Heatpath's one vocabulary of physical quantities: the canonical unit each is stored and computed
// in, the units a reading of it may be typed in, and how units are written after a number. The
// fault-tree format, the calculators and the temperature-log reader all use this table.

export const quantities = [
  'temperature',
  'temperatureDelta',
  'pressure',
  'time',
  'volume',
  'volumeFlow',
  'percentage',
  'number',
] as const;
export type Quantity = (typeof quantities)[number];

// Unit codes are mathjs unit names, except the two that have no unit ('%' and 'none').
export const unitCodes = [
  'degC',
  'degF',
  'K',
  'bar',
  'psi',
  'kPa',
  's',
  'min',
  'h',
  'L',
  'mL',
  'qt',
  'gal',
  'L/min',
  'gal/min',
  '%',
  'none',
] as const;
export type UnitCode = (typeof unitCodes)[number];

export interface QuantityInfo {
  /** The unit every value of this quantity is stored and computed in. */
  readonly canonical: UnitCode;
  /** Units a reading may be entered in; the canonical unit comes first. */
  readonly entryUnits: readonly UnitCode[];
  /** How the quantity is named in sentences ("a temperature"). */
  readonly words: string;
}

/** Canonical units: °C, K (differences), bar gauge, minutes, litres, L/min, percent, none. */
export const CANONICAL_UNITS = {
  temperature: 'degC',
  temperatureDelta: 'K',
  pressure: 'bar',
  time: 'min',
  volume: 'L',
  volumeFlow: 'L/min',
  percentage: '%',
  number: 'none',
} as const satisfies Readonly<Record<Quantity, UnitCode>>;

// Pressures are always gauge: that is what workshop gauges and cap ratings show.
export const quantityInfo: Readonly<Record<Quantity, QuantityInfo>> = {
  temperature: {
    canonical: CANONICAL_UNITS.temperature,
    entryUnits: ['degC', 'degF'],
    words: 'a temperature',
  },
  temperatureDelta: {
    canonical: CANONICAL_UNITS.temperatureDelta,
    entryUnits: ['K', 'degF'],
    words: 'a temperature difference',
  },
  pressure: {
    canonical: CANONICAL_UNITS.pressure,
    entryUnits: ['bar', 'psi', 'kPa'],
    words: 'a pressure',
  },
  time: { canonical: CANONICAL_UNITS.time, entryUnits: ['min', 's', 'h'], words: 'a time' },
  volume: {
    canonical: CANONICAL_UNITS.volume,
    entryUnits: ['L', 'mL', 'qt', 'gal'],
    words: 'a volume',
  },
  volumeFlow: {
    canonical: CANONICAL_UNITS.volumeFlow,
    entryUnits: ['L/min', 'gal/min'],
    words: 'a volume flow',
  },
  percentage: { canonical: CANONICAL_UNITS.percentage, entryUnits: ['%'], words: 'a percentage' },
  number: { canonical: CANONICAL_UNITS.number, entryUnits: ['none'], words: 'a plain number' },
};

const unitSymbols: Readonly<Record<UnitCode, string>> = {
  degC: '°C',
  degF: '°F',
  K: 'K',
  bar: 'bar',
  psi: 'psi',
  kPa: 'kPa',
  s: 's',
  min: 'min',
  h: 'h',
  L: 'L',
  mL: 'mL',
  qt: 'US qt',
  gal: 'US gal',
  'L/min': 'L/min',
  'gal/min': 'US gal/min',
  '%': '%',
  none: '',
};

/** The symbol shown after a number, e.g. "°F"; empty for plain numbers. */
export function unitSymbol(unit: UnitCode): string {
  return unitSymbols[unit];
}

export function canonicalUnitOf(quantity: Quantity): UnitCode {
  return quantityInfo[quantity].canonical;
}

export function acceptsUnit(quantity: Quantity, unit: UnitCode): boolean {
  return quantityInfo[quantity].entryUnits.includes(unit);
}
