// The findings as they stand, read only: for the service advisor, and for everyone once the case
// is diagnosed. The layout follows the repair order: concern, cause, correction, then the lines.
import type { Findings } from '@heatpath/contracts';
import { formatWithUnit, unitCodes, type UnitCode } from '@heatpath/fault-tree';
import { formatDateTime } from '../case-format';

function isUnitCode(unit: string): unit is UnitCode {
  return (unitCodes as readonly string[]).includes(unit);
}

export function FindingsView({
  findings,
  outcomeTitle,
  diagnosedAt,
}: {
  findings: Findings;
  /** The finding the walk reached, as the tree names it. */
  outcomeTitle: string | null;
  diagnosedAt: string | null;
}) {
  return (
    <section
      aria-labelledby="findings-heading"
      className="flex flex-col gap-4 rounded-panel border-2 border-line bg-surface p-4 sm:p-6"
    >
      <div className="flex flex-col gap-1">
        <div className="flex flex-wrap items-baseline gap-x-4 gap-y-1">
          <h2 id="findings-heading" className="text-xl font-bold">
            Findings
            {outcomeTitle ? <span className="sr-only">: {outcomeTitle}</span> : null}
          </h2>
          {outcomeTitle ? (
            <p aria-hidden="true" className="text-lg font-semibold">
              {outcomeTitle}
            </p>
          ) : null}
        </div>
        <p className="text-sm text-ink-muted">
          {diagnosedAt ? (
            <span className="font-semibold text-ok-ink">
              <span aria-hidden="true">✓ </span>Diagnosed {formatDateTime(diagnosedAt)}.{' '}
            </span>
          ) : (
            'Draft, not yet marked diagnosed. '
          )}
          {findings.updatedBy
            ? `Last saved by ${findings.updatedBy.name}, ${formatDateTime(findings.updatedAt)}.`
            : ''}
        </p>
      </div>
      {/* Laid out as the repair order reads: each heading beside its text on a wide screen. */}
      <dl className="grid gap-x-6 gap-y-3 md:grid-cols-[9rem_minmax(0,1fr)]">
        <dt className="font-bold">Concern</dt>
        <dd className="whitespace-pre-line">{findings.concern}</dd>
        <dt className="font-bold">Cause</dt>
        <dd className="whitespace-pre-line">{findings.cause}</dd>
        <dt className="font-bold">Correction</dt>
        <dd className="whitespace-pre-line">{findings.correction}</dd>
      </dl>
      <div className="grid gap-4 lg:grid-cols-3">
        <div>
          <h3 className="font-bold">Parts</h3>
          {findings.parts.length === 0 ? (
            <p className="text-ink-muted">None</p>
          ) : (
            <ul className="list-disc pl-6">
              {findings.parts.map((part, index) => (
                <li key={`${part.description}-${index}`}>
                  {part.quantity} × {part.description}
                  {part.partNumber ? ` (${part.partNumber})` : ''}
                </li>
              ))}
            </ul>
          )}
        </div>
        <div>
          <h3 className="font-bold">Labour</h3>
          {findings.labour.length === 0 ? (
            <p className="text-ink-muted">None</p>
          ) : (
            <ul className="list-disc pl-6">
              {findings.labour.map((line, index) => (
                <li key={`${line.operation}-${index}`}>
                  {line.operation}: {line.hours} h
                </li>
              ))}
            </ul>
          )}
        </div>
        <div>
          <h3 className="font-bold">Follow-ups</h3>
          {findings.followUps.length === 0 ? (
            <p className="text-ink-muted">None</p>
          ) : (
            <ul className="list-disc pl-6">
              {findings.followUps.map((followUp, index) => (
                <li key={`${followUp}-${index}`}>{followUp}</li>
              ))}
            </ul>
          )}
        </div>
      </div>
      {findings.readings.length > 0 ? (
        <div>
          <h3 className="font-bold">Readings</h3>
          <ul className="grid gap-x-6 md:grid-cols-2">
            {findings.readings.map((reading, index) => (
              <li key={`${reading.label}-${index}`}>
                {reading.label}:{' '}
                <span className="font-semibold">
                  {isUnitCode(reading.unit)
                    ? formatWithUnit(reading.value, reading.unit)
                    : `${reading.value} ${reading.unit}`}
                </span>
              </li>
            ))}
          </ul>
        </div>
      ) : null}
    </section>
  );
}
