// The physical quantities a measurement can ask for, the canonical unit each is stored and
// computed in, and the units a technician may type it in. Formulas only ever see canonical units.

export const quantities = [
  'temperature',
  'temperatureDelta',
  'pressure',
  'time',
  'volume',
  'percentage',
  'number',
] as const;
export type Quantity = (typeof quantities)[number];

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

// Pressures are always gauge: that is what workshop gauges and cap ratings show.
export const quantityInfo: Readonly<Record<Quantity, QuantityInfo>> = {
  temperature: { canonical: 'degC', entryUnits: ['degC', 'degF'], words: 'a temperature' },
  temperatureDelta: {
    canonical: 'K',
    entryUnits: ['K', 'degF'],
    words: 'a temperature difference',
  },
  pressure: { canonical: 'bar', entryUnits: ['bar', 'psi', 'kPa'], words: 'a pressure' },
  time: { canonical: 'min', entryUnits: ['min', 's', 'h'], words: 'a time' },
  volume: { canonical: 'L', entryUnits: ['L', 'mL', 'qt', 'gal'], words: 'a volume' },
  percentage: { canonical: '%', entryUnits: ['%'], words: 'a percentage' },
  number: { canonical: 'none', entryUnits: ['none'], words: 'a plain number' },
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
