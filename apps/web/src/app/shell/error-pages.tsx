// What a person sees when a screen cannot be shown: a missing page, a role that may not enter, or
// a failure. Each says what happened in plain words and offers a way on; none shows a raw status.
import { isRouteErrorResponse, useRevalidator, useRouteError } from 'react-router';
import { Alert } from '../../components/ui/alert';
import { Button, ButtonLink } from '../../components/ui/button';
import { PageHeader } from '../../components/ui/page';
import { isApiError } from '../../lib/api-client';
import { useDocumentTitle } from '../../lib/document-title';
import type { ForbiddenData } from '../guards';

export function NotFoundPage() {
  useDocumentTitle('Page not found');
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title="Page not found"
        lead="There is no screen at this address. It may have moved, or the link was typed wrong."
      />
      <div>
        <ButtonLink to="/" variant="primary">
          Go to home
        </ButtonLink>
      </div>
    </div>
  );
}

function isForbiddenData(value: unknown): value is ForbiddenData {
  return (
    typeof value === 'object' &&
    value !== null &&
    'message' in value &&
    typeof value.message === 'string'
  );
}

function describe(error: unknown): { title: string; message: string; canRetry: boolean } {
  if (isRouteErrorResponse(error)) {
    if (error.status === 403) {
      return {
        title: 'Not open to your role',
        message: isForbiddenData(error.data)
          ? error.data.message
          : 'Your role cannot open this screen.',
        canRetry: false,
      };
    }
    return {
      title: 'Screen not shown',
      message: 'This screen could not be shown.',
      canRetry: true,
    };
  }
  if (isApiError(error)) {
    return { title: 'Screen not loaded', message: error.message, canRetry: true };
  }
  return {
    title: 'Something went wrong',
    message: 'Heatpath hit an unexpected problem showing this screen. Try again, or go to home.',
    canRetry: true,
  };
}

/** Error page inside the signed-in frame, so the navigation stays usable. */
export function RouteErrorPage() {
  const error = useRouteError();
  const revalidator = useRevalidator();
  const isNotFound = isRouteErrorResponse(error) && error.status === 404;
  const { title, message, canRetry } = describe(error);
  useDocumentTitle(isNotFound ? 'Page not found' : title);
  if (isNotFound) return <NotFoundPage />;
  return (
    <div className="flex flex-col gap-6">
      <h1 className="text-2xl font-bold">{title}</h1>
      <Alert tone="danger" role="alert" title={message} />
      <div className="flex flex-wrap gap-3">
        {canRetry ? (
          <Button
            onClick={() => void revalidator.revalidate()}
            busy={revalidator.state === 'loading'}
            busyLabel="Trying again…"
          >
            Try again
          </Button>
        ) : null}
        <ButtonLink to="/">Go to home</ButtonLink>
      </div>
    </div>
  );
}

/** Last-resort page when even the frame cannot load (the API is unreachable at start, say). */
export function AppErrorPage() {
  const error = useRouteError();
  const { title, message } = describe(error);
  useDocumentTitle(title);
  return (
    <main className="mx-auto flex min-h-dvh max-w-xl flex-col justify-center gap-6 p-6">
      <p className="text-lg font-bold">Heatpath</p>
      <h1 className="text-2xl font-bold">{title}</h1>
      <Alert tone="danger" role="alert" title={title}>
        <p>{message}</p>
      </Alert>
      <div className="flex flex-wrap gap-3">
        {/* A full reload: the frame itself failed, so there is no router state worth keeping. */}
        <Button onClick={() => window.location.reload()}>Reload Heatpath</Button>
        <a href="/sign-in" className="inline-flex min-h-touch items-center px-2 underline">
          Go to sign-in
        </a>
      </div>
    </main>
  );
}

export function StartingUp() {
  return (
    <div role="status" className="flex min-h-dvh items-center justify-center text-ink-muted">
      Starting Heatpath…
    </div>
  );
}
