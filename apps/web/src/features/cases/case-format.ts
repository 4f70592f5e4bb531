// Words and small formats the case screens share: how a vehicle, a status, a time and a hazard
// are written. No fault-tree code at run time, so the case list stays out of the walk's chunk.
import { caseStatusLabels, type CaseStatus } from '@heatpath/contracts';
import type { BadgeTone } from '../../components/ui/badge';

export interface VehicleLike {
  plate: string | null;
  vin: string | null;
  make: string;
  model: string;
  year: number | null;
}

/** "Corvane Tessel 1.4T, 2017". */
export function vehicleName(vehicle: VehicleLike): string {
  const name = `${vehicle.make} ${vehicle.model}`;
  return vehicle.year ? `${name}, ${vehicle.year}` : name;
}

/** The plate if there is one, else the VIN; how the workshop calls the car. */
export function vehicleTag(vehicle: VehicleLike): string {
  return vehicle.plate ?? vehicle.vin ?? 'No plate or VIN';
}

export const statusTones: Record<CaseStatus, BadgeTone> = {
  open: 'neutral',
  in_diagnosis: 'neutral',
  diagnosed: 'ok',
  closed: 'neutral',
};

// A mark per status as well as the word, so the state reads in greyscale and at a glance.
export const statusMarks: Record<CaseStatus, string> = {
  open: '○',
  in_diagnosis: '◐',
  diagnosed: '✓',
  closed: '■',
};

export function statusLabel(status: CaseStatus): string {
  return caseStatusLabels[status];
}

const dateTime = new Intl.DateTimeFormat(undefined, {
  day: 'numeric',
  month: 'short',
  hour: '2-digit',
  minute: '2-digit',
});

export function formatDateTime(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : dateTime.format(date);
}

const mileage = new Intl.NumberFormat(undefined, { maximumFractionDigits: 0 });

export function formatMileage(value: number | null, unit: 'km' | 'mi'): string | null {
  return value === null ? null : `${mileage.format(value)} ${unit}`;
}
