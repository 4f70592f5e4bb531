// Formats figures for the calculator screens through the coolant package's own unit conversion.
import { formatQuantity, type DisplayUnit, type Quantity } from '@heatpath/coolant';
import { withMinus } from './units';

export function show<Q extends Quantity>(
  value: number,
  quantity: Q,
  unit: DisplayUnit<Q>,
  digits = 1,
): string {
  return withMinus(formatQuantity(value, quantity, { unit, digits }));
}

export function showPercent(value: number, basis: 'volume' | 'mass', digits = 1): string {
  return `${withMinus(value.toFixed(digits))} ${basis === 'volume' ? 'vol %' : 'mass %'}`;
}

export function showNumber(value: number, unit: string, digits = 1): string {
  return `${withMinus(value.toFixed(digits))} ${unit}`;
}
