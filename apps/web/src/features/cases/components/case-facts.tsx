// The rest of what is known about the case, at the foot of its page: the vehicle in full, how to
// reach the customer, the tree version the case is pinned to, who has it, and when it was opened.
import type { CaseDetail } from '@heatpath/contracts';
import { fuelLabels } from '@heatpath/contracts';
import { formatDateTime, formatMileage, vehicleName } from '../case-format';

export function CaseFacts({ detail }: { detail: CaseDetail }) {
  const { vehicle, customer } = detail;
  const rows: [string, string][] = [
    [
      'Vehicle',
      [vehicleName(vehicle), vehicle.engine, vehicle.fuel ? fuelLabels[vehicle.fuel] : null]
        .filter(Boolean)
        .join(' · '),
    ],
    ['VIN', vehicle.vin ?? 'Not recorded'],
    ['Plate', vehicle.plate ?? 'Not recorded'],
    [
      'Mileage at intake',
      formatMileage(detail.mileageAtIntake, detail.mileageUnit) ?? 'Not recorded',
    ],
    [
      'Customer',
      customer
        ? [customer.name, customer.phone, customer.email].filter(Boolean).join(' · ')
        : 'Not recorded',
    ],
    ['Complaint', detail.complaint],
    ['Decision tree', `${detail.tree.title}, version ${detail.tree.version}`],
    ['Assigned to', detail.assignee?.name ?? 'Not assigned'],
    ['Opened', formatDateTime(detail.createdAt)],
  ];
  return (
    <section
      aria-labelledby="case-facts-heading"
      className="rounded-panel border-2 border-line bg-surface p-4 sm:p-6"
    >
      <h2 id="case-facts-heading" className="mb-3 text-lg font-bold">
        About this case
      </h2>
      <dl className="grid gap-x-6 gap-y-2 md:grid-cols-[12rem_1fr]">
        {rows.map(([term, value]) => (
          <div key={term} className="contents">
            <dt className="font-semibold">{term}</dt>
            <dd className="mb-2 [overflow-wrap:anywhere] md:mb-0">{value}</dd>
          </div>
        ))}
      </dl>
    </section>
  );
}
