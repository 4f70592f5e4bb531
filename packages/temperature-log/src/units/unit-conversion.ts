// Unit conversions for whole channels. mathjs does the conversion (Heatpath converts with a
// library, never by hand); it is asked once per channel for a linear map, which is then applied
// to every reading, because a 100,000-row log cannot afford a mathjs call per value.
import { create, unitDependencies } from 'mathjs';
import type { FactoryFunctionMap } from 'mathjs';
import type { SpeedUnit, TemperatureUnit } from '../columns/stated-units.js';

// mathjs types its dependency bundles as possibly undefined under noUncheckedIndexedAccess.
function present(factories: FactoryFunctionMap | undefined): FactoryFunctionMap {
  if (factories === undefined) {
    throw new Error('The mathjs unit factory is missing from this build.');
  }
  return factories;
}

const math = create({ unitDependencies: present(unitDependencies) }, {});

/** value_out = value_in · scale + offset */
export interface LinearMap {
  readonly scale: number;
  readonly offset: number;
}

export const IDENTITY: LinearMap = { scale: 1, offset: 0 };

function linearMap(from: string, to: string): LinearMap {
  const offset = math.unit(0, from).toNumber(to);
  const scale = math.unit(1, from).toNumber(to) - offset;
  return { scale, offset };
}

/** The map from the file's temperature unit to °C. */
export function temperatureToCelsius(unit: TemperatureUnit): LinearMap {
  return unit === 'degC' ? IDENTITY : linearMap(unit, 'degC');
}

/** The map from the file's speed unit to km/h. */
export function speedToKph(unit: SpeedUnit): LinearMap {
  return unit === 'km/h' ? IDENTITY : linearMap('mi/h', 'km/h');
}

export function applyMap(map: LinearMap, value: number): number {
  return value * map.scale + map.offset;
}

/** The map from °C to `unit` (for writing test files and for display). */
export function celsiusTo(unit: TemperatureUnit): LinearMap {
  return unit === 'degC' ? IDENTITY : linearMap('degC', unit);
}
