// The findings of a revision, read only: for a closed case, whose repair order no longer
// changes. Laid out as the repair order reads: concern, cause, correction, then the lines.
import type { FindingsRevision, RepairOrderPhoto } from '@heatpath/contracts';

export function FindingsSummary({
  revision,
  photos,
}: {
  revision: FindingsRevision;
  photos: readonly RepairOrderPhoto[];
}) {
  const chosen = revision.photoIds.flatMap((id) => photos.filter((p) => p.id === id));
  return (
    <section
      aria-labelledby="review-heading"
      className="flex flex-col gap-4 rounded-panel border-2 border-line bg-surface p-4 sm:p-6"
    >
      <h2 id="review-heading" className="text-xl font-bold">
        Findings, revision {revision.revision}
      </h2>
      <dl className="grid gap-x-6 gap-y-3 md:grid-cols-[9rem_minmax(0,1fr)]">
        <dt className="font-bold">Concern</dt>
        <dd className="whitespace-pre-line">{revision.concern}</dd>
        <dt className="font-bold">Cause</dt>
        <dd className="whitespace-pre-line">{revision.cause}</dd>
        <dt className="font-bold">Correction</dt>
        <dd className="whitespace-pre-line">{revision.correction}</dd>
        <dt className="font-bold">Parts</dt>
        <dd>
          <ul className="list-disc pl-5">
            {revision.parts.map((p, i) => (
              <li key={i}>
                {p.description} × {p.quantity}
                {p.partNumber ? ` (${p.partNumber})` : ''}
              </li>
            ))}
          </ul>
        </dd>
        <dt className="font-bold">Labour</dt>
        <dd>
          <ul className="list-disc pl-5">
            {revision.labour.map((l, i) => (
              <li key={i}>
                {l.operation}, {l.hours} h
              </li>
            ))}
          </ul>
        </dd>
        <dt className="font-bold">Follow-ups</dt>
        <dd>
          <ol className="list-decimal pl-5">
            {revision.followUps.map((f, i) => (
              <li key={i}>{f}</li>
            ))}
          </ol>
        </dd>
        <dt className="font-bold">Photos</dt>
        <dd>{chosen.length ? chosen.map((p) => p.name).join(', ') : 'None chosen'}</dd>
      </dl>
    </section>
  );
}
