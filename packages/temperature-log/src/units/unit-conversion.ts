// Unit conversions for whole channels. The conversion is Heatpath's one mathjs unit instance in
// @heatpath/coolant (never hand-written factors); it is asked once per channel for a linear map,
// which is then applied to every reading, because a 100,000-row log cannot afford a mathjs call
// per value.
import { IDENTITY_MAP as IDENTITY, linearMap } from '@heatpath/coolant';
import type { LinearMap } from '@heatpath/coolant';
import type { SpeedUnit, TemperatureUnit } from '../columns/stated-units.js';

/** The map from the file's temperature unit to °C. */
export function temperatureToCelsius(unit: TemperatureUnit): LinearMap {
  return unit === 'degC' ? IDENTITY : linearMap(unit, 'degC');
}

/** The map from the file's speed unit to km/h. */
export function speedToKph(unit: SpeedUnit): LinearMap {
  return unit === 'km/h' ? IDENTITY : linearMap('mi/h', 'km/h');
}

/** The map from °C to `unit` (for writing test files and for display). */
export function celsiusTo(unit: TemperatureUnit): LinearMap {
  return unit === 'degC' ? IDENTITY : linearMap('degC', unit);
}
