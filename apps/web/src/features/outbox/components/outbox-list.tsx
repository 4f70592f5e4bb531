// The lead's outbox: every e-mail as its recipient gets it — recipients, subject, body and
// attachments — with its status, attempts and last error, so a newcomer sees what a customer
// would receive and a lead sees at once when the mail server is away.
import {
  outboxKindLabels,
  outboxStatusLabels,
  type OutboxMessage,
  type OutboxStatus,
} from '@heatpath/contracts';
import { Alert } from '../../../components/ui/alert';
import { Badge, type BadgeTone } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { ErrorState, LoadingState } from '../../../components/ui/status';
import { useOutbox } from '../api/get-outbox';
import { useRetryOutboxMessage } from '../api/retry-outbox-message';

const tones: Record<OutboxStatus, BadgeTone> = {
  queued: 'caution',
  sending: 'neutral',
  sent: 'ok',
  failed: 'danger',
};
const marks: Record<OutboxStatus, string> = { queued: '…', sending: '→', sent: '✓', failed: '✕' };

const dateTime = new Intl.DateTimeFormat(undefined, {
  day: 'numeric',
  month: 'short',
  hour: '2-digit',
  minute: '2-digit',
  second: '2-digit',
});
const when = (iso: string | null) => (iso ? dateTime.format(new Date(iso)) : '—');
const size = (bytes: number) =>
  bytes < 1024 * 1024
    ? `${Math.max(1, Math.round(bytes / 1024))} KB`
    : `${(bytes / 1048576).toFixed(1)} MB`;

export function OutboxList() {
  const outbox = useOutbox();
  const messages = outbox.data?.pages.flatMap((page) => page.messages) ?? [];
  if (outbox.isPending) return <LoadingState label="Loading the outbox…" />;
  if (outbox.isError)
    return (
      <ErrorState
        title="Outbox not loaded"
        message={outbox.error.message}
        onRetry={() => void outbox.refetch()}
        retrying={outbox.isRefetching}
      />
    );
  if (messages.length === 0)
    return <p className="text-ink-muted">No e-mail has been written yet.</p>;
  return (
    <div className="flex flex-col gap-4">
      <ul aria-label="Messages" className="flex flex-col gap-4">
        {messages.map((m) => (
          <li key={m.id}>
            <OutboxEntry message={m} />
          </li>
        ))}
      </ul>
      {outbox.hasNextPage ? (
        <div>
          <Button
            variant="secondary"
            busy={outbox.isFetchingNextPage}
            busyLabel="Loading…"
            onClick={() => void outbox.fetchNextPage()}
          >
            Show older messages
          </Button>
        </div>
      ) : null}
    </div>
  );
}

function OutboxEntry({ message: m }: { message: OutboxMessage }) {
  const retry = useRetryOutboxMessage();
  const headingId = `outbox-${m.id}`;
  return (
    <article
      aria-labelledby={headingId}
      className="flex flex-col gap-3 rounded-panel border-2 border-line bg-surface p-4 sm:p-6"
    >
      <div className="flex flex-wrap items-center gap-2">
        <Badge tone={tones[m.status]}>
          <span aria-hidden="true">{marks[m.status]}&nbsp;</span>
          {outboxStatusLabels[m.status]}
        </Badge>
        <span className="text-sm font-semibold text-ink-muted">{outboxKindLabels[m.kind]}</span>
      </div>
      <h2 id={headingId} className="text-lg font-bold [overflow-wrap:anywhere]">
        {m.subject}
      </h2>
      <dl className="grid gap-x-4 gap-y-1 text-sm sm:grid-cols-[8rem_minmax(0,1fr)]">
        <dt className="font-semibold">To</dt>
        <dd className="[overflow-wrap:anywhere]">
          {m.to.map((to) => (to.name ? `${to.name} <${to.address}>` : to.address)).join(', ')}
        </dd>
        <dt className="font-semibold">Written</dt>
        <dd>
          {when(m.createdAt)}
          {m.createdBy ? ` by ${m.createdBy.name}` : ' by Heatpath'}
        </dd>
        <dt className="font-semibold">Attempts</dt>
        <dd>
          {m.attempts === 0 ? 'None yet' : `${m.attempts}, the last ${when(m.lastAttemptAt)}`}
          {m.sentAt ? `; delivered ${when(m.sentAt)}` : ''}
          {m.nextAttemptAt && m.attempts > 0 ? `; next try ${when(m.nextAttemptAt)}` : ''}
        </dd>
      </dl>
      {m.lastError && m.status !== 'sent' ? (
        <Alert tone={m.status === 'failed' ? 'danger' : 'caution'} title="Last error">
          <p>{m.lastError}</p>
          {m.status === 'queued' ? <p>Heatpath tries again by itself; nothing is lost.</p> : null}
        </Alert>
      ) : null}
      <div className="rounded-control border-2 border-line bg-canvas p-3">
        <p className="mb-2 text-sm font-semibold text-ink-muted">What the recipient reads</p>
        <p className="whitespace-pre-wrap [overflow-wrap:anywhere]">{m.body}</p>
      </div>
      {m.attachments.length > 0 ? (
        <ul aria-label={`Attachments of ${m.subject}`} className="flex flex-wrap gap-2">
          {m.attachments.map((a) => (
            <li key={a.id}>
              <a
                href={a.url}
                download
                className="inline-flex min-h-touch items-center gap-2 rounded-control border-2 border-line-strong px-3 font-semibold hover:bg-sunken"
              >
                <span aria-hidden="true">↓</span> {a.filename}
                <span className="text-sm font-normal text-ink-muted">{size(a.byteSize)}</span>
              </a>
            </li>
          ))}
        </ul>
      ) : null}
      {m.status === 'failed' ? (
        <div className="flex flex-wrap items-center gap-3">
          <Button
            variant="secondary"
            busy={retry.isPending}
            busyLabel="Queuing…"
            onClick={() => retry.mutate(m.id)}
          >
            Send again
          </Button>
          {retry.error ? (
            <p className="font-semibold text-danger-ink">{retry.error.message}</p>
          ) : null}
        </div>
      ) : null}
    </article>
  );
}
