// The case page: the step the case stands at and how to answer it, then the finding and its
// editable findings, the path so far and the values worked out, photos, notes and the history.
// The case is read from GET /api/cases/:caseId (kept on the tablet by the persisted query cache),
// and the walk runs here on the case's pinned tree: answers show the next step at once and go
// through the outbox, so the page works the same with or without a network. Part of the lazily
// loaded case chunk.
import type { CaseDetail } from '@heatpath/contracts';
import type { CompiledTree } from '@heatpath/fault-tree';
import { memo, useCallback, useDeferredValue, useMemo, useState } from 'react';
import { Alert } from '../../../components/ui/alert';
import { ButtonLink } from '../../../components/ui/button';
import { ErrorState, LoadingState } from '../../../components/ui/status';
import { ComputedValues } from '../../../components/walk-step/computed-values';
import { isApiError } from '../../../lib/api-client';
import { useMe } from '../../../lib/auth';
import { isPending, useOutbox, useOutboxConnection, useOutboxReady } from '../../../lib/outbox';
import { useCase } from '../api/get-case';
import { useCaseTree } from '../case-tree';
import { useDiagnoseBlockedReason } from '../hooks/use-evidence-gate';
import { useLocalWalk, useServerWalk, type WalkControls } from '../hooks/use-local-walk';
import { AttachmentsGallery } from './attachments-gallery';
import { AuditTrail } from './audit-trail';
import { CaseFacts } from './case-facts';
import { CaseHeader } from './case-header';
import { CaseNotes } from './case-notes';
import { CurrentStep } from './current-step';
import { FindingsEditor } from './findings-editor';
import { FindingsView } from './findings-view';
import { WalkPath } from './walk-path';

export function CaseWorkspace({ caseId }: { caseId: string }) {
  const me = useMe();
  useOutboxConnection(me.id);
  const query = useCase(caseId);
  const outboxReady = useOutboxReady();

  if (query.isPending || (query.isSuccess && !outboxReady)) {
    return <LoadingState label="Loading the case…" />;
  }
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
  return <CaseWalk detail={query.data} />;
}

function CaseWalk({ detail }: { detail: CaseDetail }) {
  const tree = useCaseTree(detail);
  // Bumped when the server's walk is no longer the beginning of this tablet's: the local walk is
  // then built again from the server's history.
  const [generation, setGeneration] = useState(0);
  const rebuild = useCallback(() => setGeneration((n) => n + 1), []);
  if (!tree) return <ServerWalk detail={detail} />;
  return (
    <LocalWalk
      key={generation}
      detail={detail}
      tree={tree}
      rebuilt={generation > 0}
      onRebuild={rebuild}
    />
  );
}

function LocalWalk(props: {
  detail: CaseDetail;
  tree: CompiledTree;
  rebuilt: boolean;
  onRebuild: () => void;
}) {
  const controls = useLocalWalk(props);
  return <CaseView detail={props.detail} tree={props.tree} controls={controls} />;
}

function ServerWalk({ detail }: { detail: CaseDetail }) {
  const controls = useServerWalk(detail);
  return <CaseView detail={detail} tree={null} controls={controls} />;
}

// The panels below the step follow a tap a moment later (useDeferredValue): the next step is
// painted first, then the path, values, photos, notes and history catch up, so a tap at the car
// never waits for the whole page to be drawn again. Memoised, they skip the first, urgent render.
const PathPanel = memo(WalkPath);
const ValuesPanel = memo(ComputedValues);
const PhotosPanel = memo(AttachmentsGallery);
const NotesPanel = memo(CaseNotes);
const FactsPanel = memo(CaseFacts);
const HistoryPanel = memo(AuditTrail);
const Header = memo(CaseHeader);

const belowTheStep = '[content-visibility:auto] [contain-intrinsic-size:auto_480px]';

interface CaseViewProps {
  detail: CaseDetail;
  tree: CompiledTree | null;
  controls: WalkControls;
}

function CaseView({ detail, tree, controls }: CaseViewProps) {
  const me = useMe();
  const preferences = me.preferences.units;
  const { findings } = detail;
  const { walk } = controls;
  const items = useOutbox(detail.id);
  const waiting = items.some(isPending);
  const shownWalk = useDeferredValue(walk);
  const shownItems = useDeferredValue(items);
  const diagnoseBlocked = useDiagnoseBlockedReason(detail, walk, tree);
  const readOnlyFindings = findings && !detail.can.editFindings ? findings : null;
  // The findings belong to the finding the server reached; shown once this tablet stands there too.
  const findingsHere = findings && findings.outcomeNodeId === walk.outcome?.id ? findings : null;

  const stepTitle = useCallback(
    (nodeId: string): string | null =>
      tree?.nodes.get(nodeId)?.title ??
      shownWalk.path.find((entry) => entry.nodeId === nodeId)?.title ??
      (shownWalk.currentNodeId === nodeId ? shownWalk.currentNode.title : null),
    [tree, shownWalk],
  );
  const currentStep = useMemo(
    () => ({ id: shownWalk.currentNodeId, title: shownWalk.currentNode.title }),
    [shownWalk.currentNodeId, shownWalk.currentNode.title],
  );

  return (
    <div className="flex flex-col gap-5">
      <Header detail={detail} />

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

      <CurrentStep detail={detail} controls={controls} tree={tree} preferences={preferences} />
      {/* Road-test logs: their chart, analysis and figures for the current step. */}
      <div>
        <ButtonLink to={`/cases/${detail.id}/logs`}>Temperature logs</ButtonLink>
      </div>

      {readOnlyFindings ? null : findingsHere && detail.can.editFindings ? (
        <FindingsEditor
          key={findingsHere.outcomeNodeId}
          caseId={detail.id}
          findings={findingsHere}
          canMarkDiagnosed={detail.can.markDiagnosed}
          blockedReason={diagnoseBlocked}
        />
      ) : walk.status === 'reached-outcome' && waiting ? (
        <p
          role="status"
          className="rounded-panel border-2 border-dashed border-line bg-surface p-4 sm:p-6"
        >
          The findings are drafted when the answers reach the workshop.
        </p>
      ) : walk.status === 'reached-outcome' && !findingsHere ? (
        <LoadingState label="Drafting the findings…" />
      ) : null}

      {/* Below the step, and drawn only when scrolled to (content-visibility): a tap lays out
          and paints the step, not the whole case. */}
      <div className={`grid gap-5 lg:grid-cols-2 lg:items-start ${belowTheStep}`}>
        <PathPanel walk={shownWalk} />
        <ValuesPanel walk={shownWalk} preferences={preferences} />
      </div>
      <div className={`grid gap-5 lg:grid-cols-2 lg:items-start ${belowTheStep}`}>
        <PhotosPanel
          caseId={detail.id}
          attachments={detail.attachments}
          stepTitle={stepTitle}
          canAttach={detail.can.walk}
        />
        <NotesPanel
          caseId={detail.id}
          notes={detail.notes}
          queued={shownItems}
          currentStep={currentStep}
          stepTitle={stepTitle}
          canWrite={detail.can.walk}
        />
      </div>
      <div className={`flex flex-col gap-5 ${belowTheStep}`}>
        <FactsPanel detail={detail} />
        <HistoryPanel caseId={detail.id} stepTitle={stepTitle} />
      </div>
    </div>
  );
}
