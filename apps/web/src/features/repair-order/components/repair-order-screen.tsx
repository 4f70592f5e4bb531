// The repair order of one diagnosed case, for the service advisor (and the lead): review and
// edit the findings as new revisions, choose photos, approve, download the approved revision as
// PDF, CSV or JSON, and e-mail it. Everything comes from GET /api/cases/:caseId/findings/review.
import type { RepairOrderReview } from '@heatpath/contracts';
import { useState } from 'react';
import { Link } from 'react-router';
import { Alert } from '../../../components/ui/alert';
import { ErrorState, LoadingState } from '../../../components/ui/status';
import { isApiError } from '../../../lib/api-client';
import { useRepairOrder } from '../api/get-repair-order';
import { carName, formatDateTime } from '../format';
import { ApprovalPanel } from './approval-panel';
import { FindingsReviewForm } from './findings-review-form';
import { FindingsSummary } from './findings-summary';
import { RevisionHistory } from './revision-history';
import { SendPanel } from './send-panel';

export function RepairOrderScreen({ caseId }: { caseId: string }) {
  const query = useRepairOrder(caseId);
  if (query.isPending) return <LoadingState label="Loading the repair order…" />;
  if (query.isError) {
    const status = isApiError(query.error) ? query.error.status : 0;
    return (
      <div className="flex flex-col gap-4">
        <h1 className="text-2xl font-bold">Repair order</h1>
        <ErrorState
          title={
            status === 404
              ? 'Case not found'
              : status === 409
                ? 'No repair order yet'
                : 'Repair order not loaded'
          }
          message={query.error.message}
          onRetry={status === 404 || status === 409 ? undefined : () => void query.refetch()}
          retrying={query.isRefetching}
        />
        <p>
          <Link
            to={`/cases/${encodeURIComponent(caseId)}`}
            className="underline underline-offset-4"
          >
            Open the case
          </Link>
        </p>
      </div>
    );
  }
  return <RepairOrderView review={query.data} onReload={() => void query.refetch()} />;
}

function ApprovalState({ review }: { review: RepairOrderReview }) {
  const { current, approvedRevision } = review;
  const approved = review.revisions.find((r) => r.revision === approvedRevision);
  if (approvedRevision === null)
    return (
      <Alert tone="info" title="Not approved yet">
        <p>
          Read the findings, correct what needs it, choose the photos, then approve revision{' '}
          {current.revision} for the repair order.
        </p>
      </Alert>
    );
  if (approvedRevision === current.revision)
    return (
      <Alert tone="ok" title={`Revision ${approvedRevision} approved`}>
        <p>
          Approved by {approved?.approvedBy?.name ?? 'someone'},{' '}
          {formatDateTime(approved?.approvedAt ?? null)}. Downloads and e-mails carry this revision.
        </p>
      </Alert>
    );
  return (
    <Alert tone="caution" title={`Revision ${current.revision} is not approved`}>
      <p>
        It changed after revision {approvedRevision} was approved. Downloads and e-mails still carry
        revision {approvedRevision} until you approve the new one.
      </p>
    </Alert>
  );
}

function RepairOrderView({
  review,
  onReload,
}: {
  review: RepairOrderReview;
  onReload: () => void;
}) {
  const [dirty, setDirty] = useState(false);
  const { vehicle } = review;
  const tag = vehicle.plate ?? vehicle.vin ?? review.reference;
  return (
    <div className="flex flex-col gap-5">
      <header className="flex flex-col gap-1">
        <h1 className="text-2xl font-bold">
          Repair order · {tag}
          <span className="sr-only">, case {review.reference}</span>
        </h1>
        <p>
          {[review.reference, carName(vehicle), review.customer?.name].filter(Boolean).join(' · ')}
        </p>
        <p className="text-ink-muted">
          {review.outcomeTitle}. Diagnosed {formatDateTime(review.diagnosedAt)} by{' '}
          {review.technician?.name ?? 'the technician'}; {review.tree.title}, version{' '}
          {review.tree.version}.{' '}
          <Link
            to={`/cases/${encodeURIComponent(review.caseId)}`}
            className="font-semibold text-ink underline underline-offset-4"
          >
            Open the case
          </Link>
        </p>
      </header>

      <ApprovalState review={review} />

      {/* One column on a tablet and a phone, in the order of the work: edit, approve and
          download, send, then the readings and the history. Two columns on a wide screen. */}
      <div className="grid gap-5 xl:grid-cols-[minmax(0,1fr)_24rem] xl:items-start">
        <div className="xl:col-start-1 xl:row-span-3 xl:row-start-1">
          {review.can.edit ? (
            <FindingsReviewForm
              // A new revision starts the form afresh from what was saved.
              key={review.current.revision}
              caseId={review.caseId}
              current={review.current}
              photos={review.photos}
              onDirtyChange={setDirty}
              onReload={onReload}
            />
          ) : (
            <FindingsSummary revision={review.current} photos={review.photos} />
          )}
        </div>
        <div className="xl:col-start-2 xl:row-start-1">
          <ApprovalPanel review={review} dirty={dirty} />
        </div>
        <div className="xl:col-start-2 xl:row-start-2">
          <SendPanel review={review} dirty={dirty} />
        </div>
        <div className="xl:col-start-1 xl:row-start-4">
          <KeyReadings review={review} />
        </div>
        <div className="xl:col-start-2 xl:row-span-2 xl:row-start-3">
          <RevisionHistory revisions={review.revisions} />
        </div>
      </div>
    </div>
  );
}

function KeyReadings({ review }: { review: RepairOrderReview }) {
  const readings = review.current.readings;
  return (
    <section
      aria-labelledby="readings-heading"
      className="flex flex-col gap-3 rounded-panel border-2 border-line bg-surface p-4 sm:p-6"
    >
      <h2 id="readings-heading" className="text-xl font-bold">
        Key readings
      </h2>
      <p className="text-sm text-ink-muted">
        As the technician measured them during the walk; they print with the repair order.
      </p>
      {readings.length === 0 ? (
        <p className="text-ink-muted">No readings were taken.</p>
      ) : (
        <dl className="grid grid-cols-[minmax(0,1fr)_auto] gap-y-1 tabular-nums">
          {readings.map((r, i) => (
            <div key={`${r.nodeId ?? ''}-${r.label}-${i}`} className="contents">
              <dt className="border-b border-line py-1">{r.label}</dt>
              <dd className="border-b border-line py-1 pl-4 text-right font-semibold">
                {r.display}
              </dd>
            </div>
          ))}
        </dl>
      )}
    </section>
  );
}
