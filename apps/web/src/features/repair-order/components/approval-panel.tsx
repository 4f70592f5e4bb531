// Approving the latest revision, and downloading the approved one. An approved revision is
// frozen: exports and e-mails always carry exactly what was approved.
import type { RepairOrderReview } from '@heatpath/contracts';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { useApproveFindings } from '../api/approve-findings';
import { exportUrl } from '../api/get-repair-order';

const formats = [
  { format: 'pdf', label: 'PDF', hint: 'to print or send to the customer' },
  { format: 'csv', label: 'CSV', hint: 'parts and labour lines, one per row' },
  { format: 'json', label: 'JSON', hint: 'everything, for another system' },
] as const;

export function ApprovalPanel({ review, dirty }: { review: RepairOrderReview; dirty: boolean }) {
  const approve = useApproveFindings();
  const { current, approvedRevision } = review;
  return (
    <section
      aria-labelledby="approval-heading"
      className="flex flex-col gap-4 rounded-panel border-2 border-line bg-surface p-4 sm:p-6"
    >
      <h2 id="approval-heading" className="text-xl font-bold">
        Approve and download
      </h2>
      {review.can.approve ? (
        <div className="flex flex-col gap-2">
          <Button
            size="large"
            disabled={dirty}
            busy={approve.isPending}
            busyLabel="Approving…"
            aria-describedby="approve-hint"
            onClick={() => approve.mutate({ caseId: review.caseId, revision: current.revision })}
          >
            <span aria-hidden="true">✓</span> Approve revision {current.revision}
          </Button>
          <p id="approve-hint" className="text-sm text-ink-muted">
            {dirty
              ? 'Save your changes first: only a saved revision can be approved.'
              : 'Once approved, this revision cannot change. A later edit becomes a new revision.'}
          </p>
        </div>
      ) : null}
      {approve.error ? (
        <Alert tone="danger" role="alert" title="Not approved">
          <p>{approve.error.message}</p>
        </Alert>
      ) : null}
      {approvedRevision === null ? (
        <p className="text-ink-muted">Downloads open once a revision is approved.</p>
      ) : (
        <div className="flex flex-col gap-2">
          <p className="font-semibold">Approved revision {approvedRevision}</p>
          <ul className="flex flex-col gap-2">
            {formats.map((f) => (
              <li key={f.format}>
                <a
                  href={exportUrl(review.caseId, f.format, approvedRevision)}
                  download
                  className="flex min-h-touch w-full flex-col justify-center rounded-control border-2 border-line-strong bg-surface px-4 py-2 hover:bg-sunken"
                >
                  <span className="font-semibold">
                    <span aria-hidden="true">↓ </span>Download {f.label}
                    <span className="sr-only"> of revision {approvedRevision}</span>
                  </span>
                  <span className="text-sm text-ink-muted">{f.hint}</span>
                </a>
              </li>
            ))}
          </ul>
        </div>
      )}
    </section>
  );
}
