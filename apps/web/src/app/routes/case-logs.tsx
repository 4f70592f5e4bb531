// /cases/:caseId/logs: a case's temperature logs. Loaded lazily (see router.tsx): it brings
// recharts, which no other screen needs. This route composes two features that never import each
// other: the case (its current step, who may answer it, and the answer sender with its retries
// and idempotency keys) from features/cases, and the logs screen from features/temperature-logs.
// A reading taken from a log is sent through the case's own answer sender, so it is stored,
// retried and checked exactly as an answer typed on the case page; once stored, the person is
// taken back to the case, which now stands at the next step.
import type { CaseDetail } from '@heatpath/contracts';
import type { WalkEvent } from '@heatpath/fault-tree';
import type { QueryClient } from '@tanstack/react-query';
import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useState } from 'react';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { ButtonLink } from '../../components/ui/button';
import { PageHeader } from '../../components/ui/page';
import { ErrorState, LoadingState } from '../../components/ui/status';
import { caseQueryOptions, useCase } from '../../features/cases/api/get-case';
import { casesKeys } from '../../features/cases/api/get-cases';
import { vehicleTag } from '../../features/cases/case-format';
import { useWalkAnswers, type WalkAnswers } from '../../features/cases/hooks/use-walk-answers';
import { caseLogsQueryOptions } from '../../features/temperature-logs/api/get-case-logs';
import { TemperatureLogsWorkspace } from '../../features/temperature-logs/components/temperature-logs-workspace';
import type {
  WalkSaveState,
  WalkStep,
} from '../../features/temperature-logs/components/use-in-walk';
import { isApiError } from '../../lib/api-client';
import { hasRole, useMe } from '../../lib/auth';
import { useDocumentTitle } from '../../lib/document-title';
import { requireAreaRecord } from '../guards';

export function caseLogsLoader(queryClient: QueryClient) {
  return async ({ request, params }: LoaderFunctionArgs) => {
    await requireAreaRecord(queryClient, request, 'cases');
    if (params.caseId) {
      void queryClient.prefetchQuery(caseQueryOptions(params.caseId));
      void queryClient.prefetchQuery(caseLogsQueryOptions(params.caseId));
    }
    return null;
  };
}

function currentStepOf(detail: CaseDetail): (WalkStep & { asksForLog: boolean }) | null {
  const { walk } = detail;
  if (walk.status === 'reached-outcome') return null;
  const node = walk.currentNode;
  const evidence = 'evidence' in node && node.evidence ? node.evidence : [];
  return {
    nodeId: node.id,
    title: node.title,
    kind: node.kind,
    position: walk.position,
    inputs: node.kind === 'measurement' ? node.inputs : [],
    asksForLog: evidence.some((request) => request.kind === 'log'),
  };
}

function saveStateOf(answers: WalkAnswers): WalkSaveState {
  const { pending, notice } = answers;
  if (pending) {
    return pending.status === 'sending'
      ? { status: 'sending', message: null, fields: {} }
      : { status: 'not-saved', message: pending.problem, fields: {} };
  }
  if (notice?.kind === 'refused') {
    return { status: 'refused', message: notice.message, fields: notice.fields };
  }
  if (notice?.kind === 'moved-on')
    return { status: 'moved-on', message: notice.message, fields: {} };
  return { status: 'idle', message: null, fields: {} };
}

export function CaseLogsRoute() {
  const { caseId = '' } = useParams();
  const me = useMe();
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const query = useCase(caseId);
  const answers = useWalkAnswers(caseId);
  const [sentAt, setSentAt] = useState<number | null>(null);
  const detail = query.data;
  useDocumentTitle(detail ? `Logs · ${vehicleTag(detail.vehicle)} · ${detail.reference}` : 'Logs');

  // The answer is stored when the case's walk has moved on from the step it was given at.
  const position = detail?.walk.position;
  const stored =
    sentAt !== null &&
    !answers.pending &&
    !answers.notice &&
    position !== undefined &&
    position !== sentAt;
  useEffect(() => {
    if (stored) void navigate(`/cases/${caseId}`);
  }, [stored, caseId, navigate]);

  const onSave = useCallback(
    (event: WalkEvent, label: string, note: string) => {
      setSentAt(event.position ?? null);
      answers.answer(event, label, note);
    },
    [answers],
  );
  const onLogStored = useCallback(
    () => void queryClient.invalidateQueries({ queryKey: casesKeys.detail(caseId) }),
    [caseId, queryClient],
  );

  if (query.isPending) return <LoadingState label="Loading the case…" />;
  if (query.isError || !detail) {
    const missing = isApiError(query.error) && query.error.status === 404;
    return (
      <ErrorState
        title={missing ? 'Case not found' : 'Case not loaded'}
        message={query.error?.message ?? 'The case could not be loaded.'}
        onRetry={missing ? undefined : () => void query.refetch()}
        retrying={query.isRefetching}
      />
    );
  }

  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title="Temperature logs"
        lead={
          <p>
            <span className="font-semibold text-ink">{vehicleTag(detail.vehicle)}</span> ·{' '}
            {detail.reference} · “{detail.complaint}”
          </p>
        }
        action={
          <ButtonLink to={`/cases/${caseId}`}>
            <span aria-hidden="true">←</span> Back to the case
          </ButtonLink>
        }
      />
      <TemperatureLogsWorkspace
        caseId={caseId}
        canUpload={hasRole(me, ['lead', 'technician'])}
        canWalk={detail.can.walk}
        currentStep={currentStepOf(detail)}
        save={saveStateOf(answers)}
        onSave={onSave}
        onRetrySave={answers.retry}
        onLogStored={onLogStored}
      />
    </div>
  );
}
