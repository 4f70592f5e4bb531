// Formats figures for the calculator screens. How many digits each kind of figure carries is
// decided once, in the coolant package's display-rounding helper; this file only adds the true
// minus sign and the words the screens use.
import {
  formatFigure,
  formatSignificant,
  roundForDisplay,
  type DisplayUnit,
  type QUANTITY_FIGURES,
  type QuantityFigure,
  type SignificantFigure,
} from '@heatpath/coolant';
import { withMinus } from './units';

type UnitOf<K extends QuantityFigure> = DisplayUnit<(typeof QUANTITY_FIGURES)[K]['quantity']>;

/** A canonical value in the person's unit, rounded for its kind: show(-37.17, 'freezePoint', 'degC') → "−37 °C". */
export function show<K extends QuantityFigure>(value: number, kind: K, unit: UnitOf<K>): string {
  return withMinus(formatFigure(value, kind, unit));
}

/** A fixed-unit figure to its significant figures: showSignificant(24.63, 'heatFlow') → "25 kW". */
export function showSignificant(value: number, kind: SignificantFigure): string {
  return withMinus(formatSignificant(value, kind));
}

export function showPercent(value: number, basis: 'volume' | 'mass'): string {
  const rounded = roundForDisplay(value, 'concentration');
  return `${withMinus(String(rounded))} ${basis === 'volume' ? 'vol %' : 'mass %'}`;
}
