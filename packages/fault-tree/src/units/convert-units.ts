// Converts tree readings between the units a technician types and Heatpath's canonical units,
// with the one mathjs unit instance in @heatpath/coolant (never hand-written factors).
import { acceptsUnit, canonicalUnitOf, convertDifference, convertUnit } from '@heatpath/coolant';
import type { Quantity, UnitCode } from '@heatpath/coolant';

// Heatpath's unit codes are chosen to be mathjs unit names, except the two that have no unit.
const dimensionless = new Set<UnitCode>(['%', 'none']);

// Canonical values are rounded to 12 significant digits so that 194 °F is exactly 90 °C when it
// meets a branch written as `engineTemp >= 90`; the rounding is far below any instrument's error.
function roundCanonical(value: number): number {
  return Number(value.toPrecision(12));
}

function convert(value: number, from: UnitCode, to: UnitCode, quantity: Quantity): number {
  if (from === to || dimensionless.has(from)) {
    return value;
  }
  if (quantity === 'temperatureDelta') {
    return convertDifference(value, from, to);
  }
  return convertUnit(value, from, to);
}

function assertAccepted(quantity: Quantity, unit: UnitCode): void {
  if (!acceptsUnit(quantity, unit)) {
    throw new RangeError(`The unit ${unit} cannot be used for ${quantity}.`);
  }
}

/** Converts an entered value to the canonical unit of its quantity. Throws on a unit the quantity does not accept. */
export function toCanonical(value: number, unit: UnitCode, quantity: Quantity): number {
  assertAccepted(quantity, unit);
  return roundCanonical(convert(value, unit, canonicalUnitOf(quantity), quantity));
}

/** Converts a canonical value to one of the entry units of its quantity, for display. */
export function fromCanonical(value: number, unit: UnitCode, quantity: Quantity): number {
  assertAccepted(quantity, unit);
  return roundCanonical(convert(value, canonicalUnitOf(quantity), unit, quantity));
}
