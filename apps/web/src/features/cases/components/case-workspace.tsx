// The case page: the step the case stands at and how to answer it, then the finding and its
// editable findings, the path so far and the values worked out, photos, notes and the history.
// Everything is rebuilt from GET /api/cases/:caseId, so a reload or another device opens the case
// exactly where it stands. Part of the lazily loaded case chunk.
import type { CaseDetail } from '@heatpath/contracts';
import { Alert } from '../../../components/ui/alert';
import { ButtonLink } from '../../../components/ui/button';
import { ErrorState, LoadingState } from '../../../components/ui/status';
import { isApiError } from '../../../lib/api-client';
import { useMe } from '../../../lib/auth';
import { useCase } from '../api/get-case';
import { useWalkModel } from '../case-tree';
import { useWalkAnswers, type WalkAnswers } from '../hooks/use-walk-answers';
import { AttachmentsGallery } from './attachments-gallery';
import { AuditTrail } from './audit-trail';
import { CaseFacts } from './case-facts';
import { CaseHeader } from './case-header';
import { CaseNotes } from './case-notes';
import { ComputedValues } from '../../../components/walk-step/computed-values';
import { CurrentStep } from './current-step';
import { FindingsEditor } from './findings-editor';
import { FindingsView } from './findings-view';
import { WalkPath } from './walk-path';

export function CaseWorkspace({ caseId }: { caseId: string }) {
  const query = useCase(caseId);
  const answers = useWalkAnswers(caseId);

  if (query.isPending) return <LoadingState label="Loading the case…" />;
  if (query.isError) {
    const missing = isApiError(query.error) && query.error.status === 404;
    return (
      <ErrorState
        title={missing ? 'Case not found' : 'Case not loaded'}
        message={query.error.message}
        onRetry={missing ? undefined : () => void query.refetch()}
        retrying={query.isRefetching}
      />
    );
  }
  return <CaseView detail={query.data} answers={answers} />;
}

function CaseView({ detail, answers }: { detail: CaseDetail; answers: WalkAnswers }) {
  const me = useMe();
  const model = useWalkModel(detail);
  const preferences = me.preferences.units;
  const { walk, findings } = detail;
  const readOnlyFindings = findings && !detail.can.editFindings ? findings : null;

  const stepTitle = (nodeId: string): string | null =>
    model?.tree.nodes.get(nodeId)?.title ??
    walk.path.find((entry) => entry.nodeId === nodeId)?.title ??
    (walk.currentNodeId === nodeId ? walk.currentNode.title : null);

  return (
    <div className="flex flex-col gap-5">
      <CaseHeader detail={detail} />

      {walk.divergence ? (
        <Alert tone="danger" title="This case’s record no longer fits its tree">
          <p>
            {walk.divergence.reason} The walk stops at the last answer that fits. Ask the workshop
            lead to look at it.
          </p>
        </Alert>
      ) : null}
      {readOnlyFindings ? (
        // Read only (the advisor, or a diagnosed case): the findings are what the page is for.
        <FindingsView
          findings={readOnlyFindings}
          outcomeTitle={walk.outcome?.title ?? null}
          diagnosedAt={detail.diagnosedAt}
        />
      ) : null}

      <CurrentStep detail={detail} model={model} answers={answers} preferences={preferences} />
      {/* Road-test logs: their chart, analysis and figures for the current step. */}
      <div>
        <ButtonLink to={`/cases/${detail.id}/logs`}>Temperature logs</ButtonLink>
      </div>

      {findings && detail.can.editFindings ? (
        <FindingsEditor
          key={findings.outcomeNodeId}
          caseId={detail.id}
          findings={findings}
          canMarkDiagnosed={detail.can.markDiagnosed}
        />
      ) : !findings && walk.status === 'reached-outcome' ? (
        <LoadingState label="Drafting the findings…" />
      ) : null}

      <div className="grid gap-5 lg:grid-cols-2 lg:items-start">
        <WalkPath walk={walk} />
        <ComputedValues walk={walk} preferences={preferences} />
      </div>
      <div className="grid gap-5 lg:grid-cols-2 lg:items-start">
        <AttachmentsGallery
          caseId={detail.id}
          attachments={detail.attachments}
          stepTitle={stepTitle}
          canAttach={detail.can.walk}
        />
        <CaseNotes
          caseId={detail.id}
          notes={detail.notes}
          currentStep={{ id: walk.currentNodeId, title: walk.currentNode.title }}
          stepTitle={stepTitle}
          canWrite={detail.can.walk}
        />
      </div>
      <CaseFacts detail={detail} />
      <AuditTrail caseId={detail.id} stepTitle={stepTitle} />
    </div>
  );
}
