// Quantities and units in the editor's words, from the fault-tree package's unit table.
import { quantityInfo, unitSymbol, type Quantity, type UnitCode } from '@heatpath/fault-tree';

export const quantityLabels: Record<Quantity, string> = {
  temperature: 'Temperature',
  temperatureDelta: 'Temperature difference',
  pressure: 'Pressure (gauge)',
  time: 'Time',
  volume: 'Volume',
  volumeFlow: 'Volume flow',
  percentage: 'Percentage',
  number: 'Plain number',
};

/** "°C", "bar"; a plain number has no unit and says so. */
export function unitLabel(unit: UnitCode): string {
  return (unitSymbol(unit) as string | undefined) || (unit === 'none' ? 'no unit' : String(unit));
}

// Tolerant of an imported file's unknown quantity: validation names that problem itself.
function infoOf(quantity: Quantity) {
  return (quantityInfo as Partial<typeof quantityInfo>)[quantity] ?? quantityInfo.number;
}

export function canonicalUnit(quantity: Quantity): UnitCode {
  return infoOf(quantity).canonical;
}

/** "°C or °F": the units a reading of this quantity may be typed in. */
export function entryUnitsWords(quantity: Quantity): string {
  const units = infoOf(quantity).entryUnits.map(unitLabel);
  return units.length > 1
    ? `${units.slice(0, -1).join(', ')} or ${units.at(-1)}`
    : (units[0] ?? '');
}

export function entryUnitOptions(quantity: Quantity): { value: UnitCode; label: string }[] {
  return infoOf(quantity).entryUnits.map((unit) => ({ value: unit, label: unitLabel(unit) }));
}
