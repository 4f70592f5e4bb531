// Readings Heatpath accepts as plausible, per channel, in canonical units. A value outside is
// taken as a wrong column, a wrong unit or a sensor fault, and the file is refused with the line,
// rather than analysed. These limits are Heatpath's own choices (common practice, not a standard):
// - coolant −50…150 °C: colder than any climate a workshop meets; hotter than coolant stays
//   liquid even under a 1.4 bar cap with 50 % glycol. A °F file read as °C trips the top limit.
// - intake or charge air −50…200 °C: charge air ahead of an intercooler can pass 150 °C.
// - ambient −50…60 °C: the range of the weather.
// - vehicle speed 0…400 km/h, engine speed 0…15,000 rpm, fan duty 0…100 (percent, or 0/1).
import type { ColumnRole } from '../columns/column-roles.js';

export interface ValueBounds {
  readonly min: number;
  readonly max: number;
  /** The canonical unit the bounds are in, as shown in messages. */
  readonly unit: string;
}

export const VALUE_BOUNDS: Readonly<Record<Exclude<ColumnRole, 'time'>, ValueBounds>> = {
  coolant: { min: -50, max: 150, unit: '°C' },
  intakeAir: { min: -50, max: 200, unit: '°C' },
  ambient: { min: -50, max: 60, unit: '°C' },
  vehicleSpeed: { min: 0, max: 400, unit: 'km/h' },
  engineSpeed: { min: 0, max: 15_000, unit: 'rpm' },
  fanDuty: { min: 0, max: 100, unit: '' },
};

/** Fewest readings a log must have to be analysed. */
export const MIN_ROWS = 10;
/** Most readings one log may have (about 28 hours at 10 readings a second). */
export const MAX_ROWS = 1_000_000;
