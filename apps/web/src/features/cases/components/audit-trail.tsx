// The case's history: every answer, step back, note, upload and findings save, with who and when.
// Folded away by default and fetched only once opened, to spare a weak connection.
import { useState } from 'react';
import { Disclosure } from '../../../components/ui/disclosure';
import { ErrorState, LoadingState } from '../../../components/ui/status';
import { useCaseEvents } from '../api/get-case-events';
import { formatDateTime } from '../case-format';

interface AuditTrailProps {
  caseId: string;
  stepTitle: (nodeId: string) => string | null;
}

export function AuditTrail({ caseId, stepTitle }: AuditTrailProps) {
  const [open, setOpen] = useState(false);
  const events = useCaseEvents(caseId, open);
  return (
    <Disclosure title="History" summary="who did what, and when" onToggle={setOpen}>
      {events.isPending ? (
        <LoadingState label="Loading the history…" />
      ) : events.isError ? (
        <ErrorState
          title="History not loaded"
          message={events.error.message}
          onRetry={() => void events.refetch()}
          retrying={events.isRefetching}
        />
      ) : events.data.events.length === 0 ? (
        <p className="text-ink-muted">Nothing has happened on this case yet.</p>
      ) : (
        <ol className="flex flex-col gap-2">
          {events.data.events.map((entry) => {
            const at = entry.nodeId ? stepTitle(entry.nodeId) : null;
            return (
              <li key={entry.seq} className="grid gap-x-4 md:grid-cols-[10rem_1fr]">
                <span className="text-sm text-ink-muted">{formatDateTime(entry.createdAt)}</span>
                <span>
                  <span className="font-semibold">{entry.actor.name}</span>: {entry.summary}
                  {at ? <span className="text-ink-muted"> · {at}</span> : null}
                </span>
              </li>
            );
          })}
        </ol>
      )}
    </Disclosure>
  );
}
