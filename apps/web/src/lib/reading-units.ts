// The person's preferred units applied to readings: which unit a reading box starts in (the one
// rule for the case page, Try it and the temperature log's "use in the walk"), the units a box
// offers, the preference a unit chosen in a box stands for (the inverse of wantedUnit), and how a
// computed value is shown in the person's own units. Conversions are the fault-tree package's
// (mathjs), never done by hand here.
import type { UnitPreferences } from '@heatpath/contracts';
import {
  formatComputed,
  quantityInfo,
  unitSymbol,
  type ComputedView,
  type Quantity,
  type UnitCode,
} from '@heatpath/fault-tree';

function wantedUnit(quantity: Quantity, preferences: UnitPreferences): UnitCode | null {
  const fahrenheit = preferences.temperature === 'F';
  switch (quantity) {
    case 'temperature':
      return fahrenheit ? 'degF' : 'degC';
    case 'temperatureDelta':
      return fahrenheit ? 'degF' : 'K';
    case 'pressure':
      return preferences.pressure === 'psi' ? 'psi' : 'bar';
    case 'volume':
      return preferences.volume === 'qt' ? 'qt' : 'L';
    default:
      return null;
  }
}

/** The person's preferred unit for a quantity, where the quantity can be entered in it. */
export function preferredUnit(quantity: Quantity, preferences: UnitPreferences): UnitCode {
  const info = quantityInfo[quantity];
  const wanted = wantedUnit(quantity, preferences);
  return wanted && info.entryUnits.includes(wanted) ? wanted : info.canonical;
}

/**
 * The preference a unit chosen for a quantity stands for (°F → temperature F), so the next box of
 * that quantity starts in it; empty where no preference names the unit (kPa, seconds).
 */
export function preferenceForUnit(quantity: Quantity, unit: UnitCode): Partial<UnitPreferences> {
  switch (quantity) {
    case 'temperature':
    case 'temperatureDelta':
      return unit === 'degF'
        ? { temperature: 'F' }
        : unit === 'degC' || unit === 'K'
          ? { temperature: 'C' }
          : {};
    case 'pressure':
      return unit === 'psi' || unit === 'bar' ? { pressure: unit } : {};
    case 'volume':
      return unit === 'qt' || unit === 'L' ? { volume: unit } : {};
    default:
      return {};
  }
}

export function unitOptions(quantity: Quantity): { value: UnitCode; label: string }[] {
  return quantityInfo[quantity].entryUnits.map((unit) => ({
    value: unit,
    label: unitSymbol(unit) || 'number',
  }));
}

/** "97 °F (36.1 °C)" in the person's unit first, or just the canonical figure. */
export function computedDisplay(view: ComputedView, preferences: UnitPreferences): string | null {
  if (view.value === null || view.display === null) return null;
  const unit = preferredUnit(view.quantity, preferences);
  if (unit === view.unit) return view.display;
  return `${formatComputed(view.value, view.quantity, unit)} (${view.display})`;
}

/**
 * The person's units, adjusted to the units chosen in this step's boxes: someone typing °F sees
 * the values worked out from them in °F too.
 */
export function unitsAsEntered(
  preferences: UnitPreferences,
  chosen: readonly UnitCode[],
): UnitPreferences {
  return {
    temperature: chosen.includes('degF')
      ? 'F'
      : chosen.includes('degC')
        ? 'C'
        : preferences.temperature,
    pressure: chosen.includes('psi')
      ? 'psi'
      : chosen.includes('bar')
        ? 'bar'
        : preferences.pressure,
    volume: chosen.includes('qt') ? 'qt' : chosen.includes('L') ? 'L' : preferences.volume,
  };
}
