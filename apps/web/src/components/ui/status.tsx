// Loading and failure states shared by every screen that waits on the API.
import { Alert } from './alert';
import { Button } from './button';

export function LoadingState({ label = 'Loading…' }: { label?: string }) {
  return (
    <div role="status" className="flex items-center gap-3 py-6 text-ink-muted">
      <span
        aria-hidden="true"
        className="size-6 animate-spin rounded-full border-4 border-line border-t-primary"
      />
      <span>{label}</span>
    </div>
  );
}

interface ErrorStateProps {
  title: string;
  message: string;
  onRetry?: () => void;
  retrying?: boolean;
}

export function ErrorState({ title, message, onRetry, retrying = false }: ErrorStateProps) {
  return (
    <Alert tone="danger" title={title} role="alert">
      <p>{message}</p>
      {onRetry ? (
        <div>
          <Button variant="secondary" onClick={onRetry} busy={retrying} busyLabel="Trying again…">
            Try again
          </Button>
        </div>
      ) : null}
    </Alert>
  );
}
