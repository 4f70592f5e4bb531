// /casebook and the screens under it: the apprentice's courses and training cases, one case with
// its two ways in, the replay as it happened, a scored attempt, and their own progress. Loaded
// lazily (see router.tsx). The lead may open the case screens by link to see what an apprentice
// sees; "My progress" is the apprentice's own.
import type { QueryClient } from '@tanstack/react-query';
import { useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { ButtonLink } from '../../components/ui/button';
import { PageHeader } from '../../components/ui/page';
import { attemptQueryOptions, useAttempt } from '../../features/training/api/get-attempt';
import { casebookQueryOptions } from '../../features/training/api/get-casebook';
import { myProgressQueryOptions, useMyProgress } from '../../features/training/api/get-my-progress';
import { replayQueryOptions } from '../../features/training/api/get-replay';
import { AttemptFlow } from '../../features/training/components/attempt-flow';
import { CasebookCase } from '../../features/training/components/casebook-case';
import { CasebookOverview } from '../../features/training/components/casebook-overview';
import { MyProgress } from '../../features/training/components/my-progress';
import { ReplayViewer } from '../../features/training/components/replay-viewer';
import { useMe } from '../../lib/auth';
import { useDocumentTitle } from '../../lib/document-title';
import { requireArea, requireAreaRecord } from '../guards';

function BackTo({ to, label }: { to: string; label: string }) {
  return (
    <div>
      <ButtonLink to={to} variant="quiet" className="-ml-4">
        <span aria-hidden="true">←</span> {label}
      </ButtonLink>
    </div>
  );
}

export function casebookLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    await requireAreaRecord(queryClient, request, 'casebook');
    void queryClient.prefetchQuery(casebookQueryOptions());
    return null;
  };
}

export function CasebookRoute() {
  const me = useMe();
  useDocumentTitle('Casebook');
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title="Casebook"
        lead="Finished cases from this workshop, chosen by the lead. Predict each step before it is revealed, or replay a case as it happened."
        action={
          me.role === 'apprentice' ? (
            <ButtonLink to="/casebook/progress" size="large">
              My progress
            </ButtonLink>
          ) : undefined
        }
      />
      <CasebookOverview />
    </div>
  );
}

export function casebookCaseLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    const me = await requireAreaRecord(queryClient, request, 'casebook');
    void queryClient.prefetchQuery(casebookQueryOptions());
    if (me.role === 'apprentice') void queryClient.prefetchQuery(myProgressQueryOptions());
    return null;
  };
}

export function CasebookCaseRoute() {
  const { trainingCaseId = '' } = useParams();
  const me = useMe();
  const progress = useMyProgress({ enabled: me.role === 'apprentice' });
  useDocumentTitle('Training case');
  return (
    <div className="flex flex-col gap-6">
      <BackTo to="/casebook" label="Casebook" />
      <CasebookCase
        key={trainingCaseId}
        trainingCaseId={trainingCaseId}
        history={progress.data?.history}
      />
    </div>
  );
}

export function replayLoader(queryClient: QueryClient) {
  return async ({ request, params }: LoaderFunctionArgs) => {
    await requireAreaRecord(queryClient, request, 'casebook');
    if (params.trainingCaseId)
      void queryClient.prefetchQuery(replayQueryOptions(params.trainingCaseId));
    return null;
  };
}

export function ReplayRoute() {
  const { trainingCaseId = '' } = useParams();
  const [search, setSearch] = useSearchParams();
  const me = useMe();
  const step = Number.parseInt(search.get('step') ?? '1', 10);
  useDocumentTitle('Replay');
  return (
    <div className="flex flex-col gap-6">
      {me.role === 'lead' ? (
        <BackTo to="/training" label="Training" />
      ) : (
        <BackTo to={`/casebook/${encodeURIComponent(trainingCaseId)}`} label="The case" />
      )}
      <ReplayViewer
        trainingCaseId={trainingCaseId}
        position={Number.isFinite(step) ? step - 1 : 0}
        onMove={(next) => setSearch({ step: String(next + 1) }, { preventScrollReset: true })}
      />
    </div>
  );
}

export function attemptLoader(queryClient: QueryClient) {
  return async ({ request, params }: LoaderFunctionArgs) => {
    await requireAreaRecord(queryClient, request, 'casebook');
    if (params.attemptId) void queryClient.prefetchQuery(attemptQueryOptions(params.attemptId));
    return null;
  };
}

export function AttemptRoute() {
  const { attemptId = '' } = useParams();
  const attempt = useAttempt(attemptId);
  useDocumentTitle(
    attempt.data ? `Predict · ${attempt.data.trainingCase.symptom}` : 'Predict, then see',
  );
  return (
    <div className="flex flex-col gap-6">
      <BackTo
        to={
          attempt.data
            ? `/casebook/${encodeURIComponent(attempt.data.trainingCaseId)}`
            : '/casebook'
        }
        label="The case"
      />
      <AttemptFlow key={attemptId} attemptId={attemptId} />
    </div>
  );
}

export function myProgressLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    await requireArea(queryClient, request, 'casebook');
    void queryClient.prefetchQuery(myProgressQueryOptions());
    return null;
  };
}

export function MyProgressRoute() {
  useDocumentTitle('My progress');
  return (
    <div className="flex flex-col gap-6">
      <BackTo to="/casebook" label="Casebook" />
      <PageHeader title="My progress" lead="Your own scores. Nobody else’s are shown to you." />
      <MyProgress />
    </div>
  );
}
