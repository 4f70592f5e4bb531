// The case in three lines: the car (plate first, as the workshop calls it), the reference and
// status; who it belongs to and the mileage; the complaint in the customer's words.
import type { CaseDetail } from '@heatpath/contracts';
import type { ReactNode } from 'react';
import { formatMileage, vehicleName, vehicleTag } from '../case-format';
import { CaseStatusBadge } from './case-status-badge';

export function CaseHeader({ detail, aside }: { detail: CaseDetail; aside?: ReactNode }) {
  const mileage = formatMileage(detail.mileageAtIntake, detail.mileageUnit);
  const facts = [
    vehicleName(detail.vehicle),
    detail.customer?.name ?? null,
    mileage ? `${mileage} at intake` : null,
  ].filter(Boolean);
  return (
    <header className="flex flex-col gap-1">
      <div className="flex flex-wrap items-center gap-x-4 gap-y-1">
        <h1 className="text-2xl font-bold">
          {vehicleTag(detail.vehicle)}
          <span className="sr-only">, case {detail.reference}</span>
        </h1>
        <span aria-hidden="true" className="font-semibold text-ink-muted">
          {detail.reference}
        </span>
        <CaseStatusBadge status={detail.status} />
        {aside ? <div className="ml-auto">{aside}</div> : null}
      </div>
      <p>{facts.join(' · ')}</p>
      <p className="line-clamp-2 text-ink-muted">
        <span className="sr-only">Complaint: </span>“{detail.complaint}”
      </p>
      <p className="text-sm text-ink-muted">
        {detail.tree.title}, version {detail.tree.version}
        {' · '}
        {detail.assignee ? `Assigned to ${detail.assignee.name}` : 'Not assigned'}
      </p>
    </header>
  );
}
