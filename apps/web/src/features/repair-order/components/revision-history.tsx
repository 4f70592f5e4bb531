// Who changed what: every revision of the findings, newest first, with who saved it, when, what
// it changed against the one before, and which were approved.
import type { FindingsRevision } from '@heatpath/contracts';
import { Badge } from '../../../components/ui/badge';
import { formatDateTime } from '../format';

export function RevisionHistory({ revisions }: { revisions: readonly FindingsRevision[] }) {
  return (
    <section
      aria-labelledby="history-heading"
      className="flex flex-col gap-3 rounded-panel border-2 border-line bg-surface p-4 sm:p-6"
    >
      <h2 id="history-heading" className="text-xl font-bold">
        History
      </h2>
      <ol className="flex flex-col gap-3">
        {revisions.map((r) => (
          <li key={r.revision} className="flex flex-col gap-1 border-l-4 border-line pl-3">
            <p className="flex flex-wrap items-center gap-x-2 gap-y-1">
              <span className="font-bold">Revision {r.revision}</span>
              {r.approvedAt ? (
                <Badge tone="ok">
                  <span aria-hidden="true">✓&nbsp;</span>Approved
                </Badge>
              ) : null}
            </p>
            <p className="text-sm text-ink-muted">
              Saved by {r.savedBy?.name ?? 'someone no longer listed'}, {formatDateTime(r.savedAt)}
              {r.approvedAt
                ? `. Approved by ${r.approvedBy?.name ?? 'someone'}, ${formatDateTime(r.approvedAt)}`
                : ''}
              .
            </p>
            <ul className="list-disc pl-5 text-sm">
              {r.changes.map((change) => (
                <li key={change}>{change}</li>
              ))}
            </ul>
          </li>
        ))}
      </ol>
    </section>
  );
}
