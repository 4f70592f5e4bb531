// Formats numbers and quantities for the sentences Heatpath shows: a few decimals at most, the
// unit symbol after the number, and the canonical and entered units side by side where they differ.
import { fromCanonical } from './convert-units.js';
import type { Quantity, UnitCode } from './quantities.js';
import { canonicalUnitOf, unitSymbol } from './quantities.js';

/** Up to `decimals` decimals, no trailing zeros, never "-0". */
export function formatNumber(value: number, decimals = 2): string {
  if (!Number.isFinite(value)) {
    return String(value);
  }
  const rounded = Number(value.toFixed(decimals));
  return String(Object.is(rounded, -0) ? 0 : rounded);
}

/** "90 °C", "12.5 %", "3" (a plain number has no symbol). */
export function formatWithUnit(value: number, unit: UnitCode): string {
  const symbol = unitSymbol(unit);
  if (symbol === '') {
    return formatNumber(value);
  }
  return unit === '%' ? `${formatNumber(value)} %` : `${formatNumber(value)} ${symbol}`;
}

/** A canonical value shown in `unit` (defaults to the canonical unit). */
export function formatCanonical(value: number, quantity: Quantity, unit?: UnitCode): string {
  const shown = unit ?? canonicalUnitOf(quantity);
  return formatWithUnit(fromCanonical(value, shown, quantity), shown);
}

/**
 * Decimals a worked-out value is shown with: no more than its inputs support. Freezing and
 * boiling points and other computed temperatures come from readings good to about ±1 K
 * (refractometer, ASTM D3321; IR and contact thermometers) and from tables that differ by 2–3 K,
 * so whole degrees; a temperature difference to a tenth of a kelvin; pressures to a hundredth
 * of a bar (about 0.15 psi, finer than a tester's dial is read). Branches use the full value.
 */
const computedDecimals: Partial<Record<Quantity, number>> = {
  temperature: 0,
  temperatureDelta: 1,
};

/** A computed value as shown to people, rounded by its quantity; `unit` defaults to canonical. */
export function formatComputed(value: number, quantity: Quantity, unit?: UnitCode): string {
  const shown = unit ?? canonicalUnitOf(quantity);
  const decimals = computedDecimals[quantity] ?? 2;
  const number = formatNumber(fromCanonical(value, shown, quantity), decimals);
  const symbol = unitSymbol(shown);
  if (symbol === '') return number;
  return `${number} ${symbol}`;
}

/** "between 0 and 150 °C" or, when a person typed another unit, "between 32 and 302 °F (0 and 150 °C)". */
export function formatRange(
  range: { readonly min: number; readonly max: number },
  quantity: Quantity,
  enteredUnit?: UnitCode,
): string {
  const canonical = canonicalUnitOf(quantity);
  const inCanonical = `${formatNumber(range.min)} and ${formatWithUnit(range.max, canonical)}`;
  if (enteredUnit === undefined || enteredUnit === canonical) {
    return `between ${inCanonical}`;
  }
  const min = fromCanonical(range.min, enteredUnit, quantity);
  const max = fromCanonical(range.max, enteredUnit, quantity);
  return `between ${formatNumber(min)} and ${formatWithUnit(max, enteredUnit)} (${inCanonical})`;
}
