// The lower-case text a case is found by: its reference, plate, VIN, customer and vehicle.
import { plateKey } from '@heatpath/contracts';
import { caseReference } from '../../lib/case-reference';

// Still reached here by services outside cases (trees, training) until they import lib directly.
export { caseReference };

export function caseSearchText(parts: {
  number: number;
  plate: string | null;
  vin: string | null;
  customerName: string | null;
  make: string;
  model: string;
}): string {
  return [
    caseReference(parts.number),
    parts.plate,
    parts.plate ? plateKey(parts.plate) : null,
    parts.vin,
    parts.customerName,
    parts.make,
    parts.model,
  ]
    .filter(Boolean)
    .join(' ')
    .toLowerCase();
}
