// The service advisor's queue: diagnosed cases, newest first, each opening its repair order.
import { useState } from 'react';
import { Link } from 'react-router';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { ErrorState, LoadingState } from '../../../components/ui/status';
import { useDebouncedValue } from '../../../lib/use-debounced-value';
import { useReviewQueue } from '../api/get-review-queue';
import { carName, formatDateTime } from '../format';

export function ReviewQueue() {
  const [text, setText] = useState('');
  const q = useDebouncedValue(text.trim(), 350) || undefined;
  const queue = useReviewQueue(q);
  const rows = queue.data?.pages.flatMap((page) => page.cases) ?? [];
  return (
    <div className="flex flex-col gap-5">
      <div className="max-w-md">
        <TextField
          label="Find a case"
          hint="Reference, plate, VIN, customer, make or model"
          type="search"
          value={text}
          onChange={(e) => setText(e.target.value)}
        />
      </div>
      {queue.isPending ? (
        <LoadingState label="Loading diagnosed cases…" />
      ) : queue.isError ? (
        <ErrorState
          title="Cases not loaded"
          message={queue.error.message}
          onRetry={() => void queue.refetch()}
          retrying={queue.isRefetching}
        />
      ) : rows.length === 0 ? (
        <p className="text-ink-muted">
          {q ? 'No diagnosed case matches that.' : 'No case has been diagnosed yet.'}
        </p>
      ) : (
        <ul aria-label="Diagnosed cases" className="flex flex-col gap-3">
          {rows.map((c) => (
            <li key={c.id}>
              <Link
                to={`/cases/${encodeURIComponent(c.id)}/repair-order`}
                className="flex min-h-touch flex-col gap-1 rounded-panel border-2 border-line bg-surface p-4 hover:border-primary hover:bg-sunken"
              >
                <span className="flex flex-wrap items-baseline gap-x-3">
                  <span className="text-lg font-bold">{c.vehicle.plate ?? c.vehicle.vin ?? c.reference}</span>
                  <span className="font-semibold text-ink-muted">{c.reference}</span>
                </span>
                <span>
                  {[carName(c.vehicle), c.customerName].filter(Boolean).join(' · ')}
                </span>
                <span className="line-clamp-1 text-ink-muted">“{c.complaint}”</span>
                <span className="text-sm text-ink-muted">
                  Updated {formatDateTime(c.updatedAt)}
                  {c.assignee ? ` · ${c.assignee.name}` : ''} ·{' '}
                  <span className="font-semibold text-ink underline underline-offset-4">
                    Open the repair order
                  </span>
                </span>
              </Link>
            </li>
          ))}
        </ul>
      )}
      {queue.hasNextPage ? (
        <div>
          <Button
            variant="secondary"
            busy={queue.isFetchingNextPage}
            busyLabel="Loading…"
            onClick={() => void queue.fetchNextPage()}
          >
            Show more
          </Button>
        </div>
      ) : null}
    </div>
  );
}
