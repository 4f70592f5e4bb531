// Heatpath's one mathjs unit instance, built with `create` and only the unit factory so a screen
// that imports it does not pull in the whole library. Every unit conversion in Heatpath (typed
// calculator input, tree readings, temperature-log channels) goes through this module.
import { create, isUnit, unitDependencies } from 'mathjs';
import type { FactoryFunctionMap, Unit } from 'mathjs';

// mathjs types its dependency bundles as possibly undefined under noUncheckedIndexedAccess.
function present(factories: FactoryFunctionMap | undefined): FactoryFunctionMap {
  if (factories === undefined) {
    throw new Error('The mathjs unit factory is missing from this build.');
  }
  return factories;
}

const math = create({ unitDependencies: present(unitDependencies) }, {});

export type { Unit };
export { isUnit };

/** Parses "195 degF" into a mathjs Unit; throws on text mathjs cannot read. */
export function parseUnitText(text: string): Unit {
  return math.unit(text);
}

/** A mathjs Unit of `value` in `unit`. */
export function unitOf(value: number, unit: string): Unit {
  return math.unit(value, unit);
}

/** `value` in `from` expressed in `to`, offsets included (90 °C → 194 °F). */
export function convertUnit(value: number, from: string, to: string): number {
  return math.unit(value, from).toNumber(to);
}

/** A difference converted without offsets: 9 °F of difference is 5 K, never −12.8 °C. */
export function convertDifference(value: number, from: string, to: string): number {
  const kelvin = from === 'K' ? value : differenceInKelvin(math.unit(value, from));
  return math.unit(kelvin, 'K').toNumber(to) - math.unit(0, 'K').toNumber(to);
}

/** A parsed temperature difference (e.g. "9 degF") in kelvin, without the unit's offset. */
export function differenceInKelvin(u: Unit): number {
  return u.toNumber('K') - math.unit(0, u.formatUnits()).toNumber('K');
}

/** value_out = value_in · scale + offset */
export interface LinearMap {
  readonly scale: number;
  readonly offset: number;
}

export const IDENTITY_MAP: LinearMap = { scale: 1, offset: 0 };

/**
 * The linear map from `from` to `to`, asked of mathjs once so that a long series can be converted
 * without a mathjs call per value.
 */
export function linearMap(from: string, to: string): LinearMap {
  const offset = convertUnit(0, from, to);
  const scale = convertUnit(1, from, to) - offset;
  return { scale, offset };
}

export function applyMap(map: LinearMap, value: number): number {
  return value * map.scale + map.offset;
}
