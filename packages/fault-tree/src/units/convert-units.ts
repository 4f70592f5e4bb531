// Converts readings between the units a technician types and Heatpath's canonical units, using
// mathjs units (built with `create` and only the unit factory) rather than hand-written factors.
import { create, unitDependencies } from 'mathjs';
import type { FactoryFunctionMap } from 'mathjs';
import type { Quantity, UnitCode } from './quantities.js';
import { acceptsUnit, canonicalUnitOf } from './quantities.js';

// mathjs types its dependency bundles as possibly undefined under noUncheckedIndexedAccess.
function present(factories: FactoryFunctionMap | undefined): FactoryFunctionMap {
  if (factories === undefined) {
    throw new Error('The mathjs unit factory is missing from this build.');
  }
  return factories;
}

const math = create({ unitDependencies: present(unitDependencies) }, {});

// Heatpath's unit codes are chosen to be mathjs unit names, except the two that have no unit.
const dimensionless = new Set<UnitCode>(['%', 'none']);

// Canonical values are rounded to 12 significant digits so that 194 °F is exactly 90 °C when it
// meets a branch written as `engineTemp >= 90`; the rounding is far below any instrument's error.
function roundCanonical(value: number): number {
  return Number(value.toPrecision(12));
}

function convertDifference(value: number, from: UnitCode, to: UnitCode): number {
  // A difference has no offset: 9 °F of difference is 5 K, never −12.8 °C.
  const scaled = math.unit(value, from).toNumber('K') - math.unit(0, from).toNumber('K');
  return math.unit(scaled, 'K').toNumber(to) - math.unit(0, 'K').toNumber(to);
}

function convert(value: number, from: UnitCode, to: UnitCode, quantity: Quantity): number {
  if (from === to || dimensionless.has(from)) {
    return value;
  }
  if (quantity === 'temperatureDelta') {
    return convertDifference(value, from, to);
  }
  return math.unit(value, from).toNumber(to);
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
