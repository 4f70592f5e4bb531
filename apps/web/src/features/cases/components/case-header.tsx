// The case in three short lines: the car (plate first, as the workshop calls it), the reference
// and status; the vehicle, customer and mileage; the complaint in the customer's words.
// Kept short so the step below it stays in view on a tablet.
import type { CaseDetail } from '@heatpath/contracts';
import { formatMileage, vehicleName, vehicleTag } from '../case-format';
import { CaseStatusBadge } from './case-status-badge';

export function CaseHeader({ detail }: { detail: CaseDetail }) {
  const mileage = formatMileage(detail.mileageAtIntake, detail.mileageUnit);
  const facts = [vehicleName(detail.vehicle), detail.customer?.name ?? null, mileage].filter(
    Boolean,
  );
  return (
    <header className="flex flex-col gap-0.5">
      <div className="flex flex-wrap items-center gap-x-4 gap-y-1">
        <h1 className="text-2xl font-bold">
          {vehicleTag(detail.vehicle)}
          <span className="sr-only">, case {detail.reference}</span>
        </h1>
        <span aria-hidden="true" className="font-semibold text-ink-muted">
          {detail.reference}
        </span>
        <CaseStatusBadge status={detail.status} />
      </div>
      <p>{facts.join(' · ')}</p>
      <p className="line-clamp-2 text-ink-muted lg:line-clamp-1">
        <span className="sr-only">Complaint: </span>“{detail.complaint}”
      </p>
    </header>
  );
}
