// Where an answer stands between the tap and the server: being saved, not saved yet (with Retry),
// refused, or overtaken by the case having moved on elsewhere. Shown right by the step.
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import type { AnswerNotice, PendingAnswer } from '../hooks/use-walk-answers';

interface AnswerStatusProps {
  pending: PendingAnswer | null;
  notice: AnswerNotice | null;
  onRetry: () => void;
  onDiscard: () => void;
  onDismiss: () => void;
}

export function AnswerStatus({
  pending,
  notice,
  onRetry,
  onDiscard,
  onDismiss,
}: AnswerStatusProps) {
  if (pending?.status === 'sending') {
    return (
      <div
        role="status"
        className="flex items-center gap-3 rounded-control bg-info-bg p-3 text-info-ink"
      >
        <span
          aria-hidden="true"
          className="size-5 shrink-0 animate-spin rounded-full border-4 border-info-line border-t-transparent"
        />
        <span>
          Saving “{pending.label}”{pending.attempts > 1 ? ` (try ${pending.attempts})` : ''}…
        </span>
      </div>
    );
  }
  if (pending?.status === 'not-saved') {
    return (
      <Alert tone="danger" role="alert" title="Not saved yet">
        <p>
          “{pending.label}” is kept on this device but has not reached the server. It is sent again
          by itself when the connection is back.
        </p>
        {pending.problem ? <p className="text-sm">{pending.problem}</p> : null}
        <div className="flex flex-wrap gap-3">
          <Button onClick={onRetry}>Retry</Button>
          <Button variant="quiet" onClick={onDiscard}>
            Discard answer
          </Button>
        </div>
      </Alert>
    );
  }
  if (notice?.kind === 'moved-on') {
    return (
      <Alert tone="info" role="alert" title="The case has moved on">
        <p>
          “{notice.label}” was not saved: the case changed elsewhere, perhaps on another device. It
          now shows where the case stands.
        </p>
        <div>
          <Button variant="secondary" onClick={onDismiss}>
            Got it
          </Button>
        </div>
      </Alert>
    );
  }
  if (notice?.kind === 'refused') {
    return (
      <Alert tone="danger" role="alert" title="Answer not accepted">
        <p>{notice.message}</p>
      </Alert>
    );
  }
  return null;
}
