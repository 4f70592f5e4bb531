// The one place that decides how many digits a figure shown to a person carries. Computations
// keep full precision; only what reaches a screen or an explanation is rounded, to what its
// source and the readings behind it support — showing −37.17 °C for a mix a refractometer reads
// to ±1 K claims a precision nobody has.
import { fromCanonical, formatQuantity } from './units.js';
import type { DisplayUnit } from './units.js';
import type { Quantity } from './units/quantities.js';

interface QuantityPrecision<Q extends Quantity> {
  readonly quantity: Q;
  /** Decimals in the canonical unit; other units get as many as keep the same step or finer. */
  readonly decimals: number;
  readonly why: string;
}

/** Figures with a unit the person may switch (°C/°F, bar/psi, L/qt). */
export const QUANTITY_FIGURES = {
  freezePoint: {
    quantity: 'temperature',
    decimals: 0,
    why: 'Refractometers read to about ±1 K (ASTM D3321) and handbooks differ by 2–3 K at rich mixes.',
  },
  boilingPoint: {
    quantity: 'temperature',
    decimals: 0,
    why: 'IAPWS-IF97 is exact, but a cap opens within about ±0.1 bar of its rating, ±2 K of boiling point.',
  },
  boilingMargin: {
    quantity: 'temperatureDelta',
    decimals: 0,
    why: 'A difference from a boiling point shown to 1 K cannot be finer than 1 K.',
  },
  temperature: {
    quantity: 'temperature',
    decimals: 1,
    why: 'Readings typed by the person, or their mean; shown as read.',
  },
  temperatureDifference: {
    quantity: 'temperatureDelta',
    decimals: 1,
    why: 'The difference of two typed readings; shown as read.',
  },
  pressure: {
    quantity: 'pressure',
    decimals: 2,
    why: 'Tester dials read to about 0.05 bar; two decimals of a bar keep a typed reading as typed.',
  },
  pressureRate: {
    quantity: 'pressure',
    decimals: 3,
    why: 'A fall per minute is a tenth of a 10-minute fall; one more decimal than a pressure.',
  },
  volume: {
    quantity: 'volume',
    decimals: 1,
    why: 'A measuring jug is read to about 0.1 L.',
  },
  volumeFlow: {
    quantity: 'volumeFlow',
    decimals: 0,
    why: 'Workshop flow meters read to a few per cent.',
  },
  concentration: {
    quantity: 'percentage',
    decimals: 0,
    why: 'A ±1 K refractometer reading is about ±1 vol % near 50 %.',
  },
} as const satisfies Record<string, QuantityPrecision<Quantity>>;

/** Figures in a fixed unit, rounded to significant figures. */
export const SIGNIFICANT_FIGURES = {
  heatFlow: {
    unit: 'kW',
    digits: 2,
    why: 'A ±1 K infrared reading on a 5–10 K drop is already 10–20 %, and flow meters a few per cent more.',
  },
  massFlow: { unit: 'kg/s', digits: 2, why: 'Carries the flow reading’s few per cent.' },
  density: { unit: 'kg/m³', digits: 3, why: 'Sources differ by up to 1 % (trade-facts.md).' },
  specificHeat: {
    unit: 'J/(kg·K)',
    digits: 3,
    why: 'Sources differ by up to 1 % (trade-facts.md).',
  },
} as const;

export type QuantityFigure = keyof typeof QUANTITY_FIGURES;
export type SignificantFigure = keyof typeof SIGNIFICANT_FIGURES;
export type FigureKind = QuantityFigure | SignificantFigure;
type QuantityOf<K extends QuantityFigure> = (typeof QUANTITY_FIGURES)[K]['quantity'];

function decimalsIn<Q extends Quantity>(
  quantity: Q,
  decimals: number,
  unit: DisplayUnit<Q>,
): number {
  if (quantity === 'percentage' || quantity === 'number') return decimals;
  // The canonical step expressed in the display unit (°C → °F: 1 K is 1.8 °F).
  const step = 10 ** -decimals;
  const shownStep = Math.abs(
    fromCanonical(step, quantity, unit) - fromCanonical(0, quantity, unit),
  );
  return Math.max(0, Math.ceil(-Math.log10(shownStep) - 1e-9));
}

function roundTo(value: number, decimals: number): number {
  const rounded = Number(value.toFixed(decimals));
  return Object.is(rounded, -0) ? 0 : rounded;
}

/** Rounds to `digits` significant figures: 24.63 → 25, 1034.77 → 1030. */
export function roundSignificant(value: number, digits: number): number {
  if (value === 0 || !Number.isFinite(value)) return value;
  const rounded = Number(value.toPrecision(digits));
  return Object.is(rounded, -0) ? 0 : rounded;
}

/**
 * A canonical value rounded for display, in `unit` (default the canonical unit), as a number:
 * for a screen that builds its own text.
 */
export function roundForDisplay<K extends QuantityFigure>(
  value: number,
  kind: K,
  unit?: DisplayUnit<QuantityOf<K>>,
): number {
  const { quantity, decimals } = QUANTITY_FIGURES[kind] as QuantityPrecision<QuantityOf<K>>;
  if (unit === undefined) return roundTo(value, decimals);
  return roundTo(fromCanonical(value, quantity, unit), decimalsIn(quantity, decimals, unit));
}

/** A canonical value as text with its unit, rounded: formatFigure(-37.17, 'freezePoint') → "-37 °C". */
export function formatFigure<K extends QuantityFigure>(
  value: number,
  kind: K,
  unit?: DisplayUnit<QuantityOf<K>>,
): string {
  const { quantity, decimals } = QUANTITY_FIGURES[kind] as QuantityPrecision<QuantityOf<K>>;
  const digits = unit === undefined ? decimals : decimalsIn(quantity, decimals, unit);
  return formatQuantity(value, quantity, unit === undefined ? { digits } : { unit, digits });
}

/** A fixed-unit figure as text, to its significant figures: formatSignificant(24.63, 'heatFlow') → "25 kW". */
export function formatSignificant(value: number, kind: SignificantFigure): string {
  const { unit, digits } = SIGNIFICANT_FIGURES[kind];
  return `${String(roundSignificant(value, digits))} ${unit}`;
}
