// /trees/:treeId/draft and /trees/:treeId/draft/publish: the draft editor (live graph, forms,
// validation, "Try it") and the check-and-publish screen. Loaded lazily (see router.tsx): they
// bring the graph library, its layout, and the fault-tree package with mathjs.
import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { Alert } from '../../components/ui/alert';
import { Button, ButtonLink } from '../../components/ui/button';
import { PageHeader } from '../../components/ui/page';
import { ErrorState, LoadingState } from '../../components/ui/status';
import { draftQueryOptions, forgetDraft, useDraft } from '../../features/trees/api/get-draft';
import { treeQueryOptions, useTree } from '../../features/trees/api/get-tree';
import { useStartDraft } from '../../features/trees/api/start-draft';
import { DraftEditor } from '../../features/trees/components/draft-editor';
import { PublishDraftPanel } from '../../features/trees/components/publish-draft-panel';
import { isApiError } from '../../lib/api-client';
import { useDocumentTitle } from '../../lib/document-title';
import { requireArea } from '../guards';

export function draftLoader(queryClient: QueryClient) {
  return async ({ request, params }: LoaderFunctionArgs) => {
    await requireArea(queryClient, request, 'trees');
    if (params.treeId) void queryClient.prefetchQuery(draftQueryOptions(params.treeId));
    return null;
  };
}

/** What to show when the tree has no open draft: say so, and offer to start one. */
function NoDraft({ treeId, message }: { treeId: string; message: string }) {
  const startDraft = useStartDraft();
  return (
    <Alert tone="info" title="No draft open">
      <p>{message}</p>
      <div className="flex flex-wrap gap-3">
        <Button
          busy={startDraft.isPending}
          busyLabel="Starting…"
          onClick={() => startDraft.mutate({ treeId })}
        >
          Start a draft
        </Button>
        <ButtonLink to={`/trees/${treeId}`}>Versions</ButtonLink>
      </div>
      {startDraft.isError ? <p className="font-semibold">{startDraft.error.message}</p> : null}
    </Alert>
  );
}

export function DraftRoute() {
  const { treeId = '' } = useParams();
  const navigate = useNavigate();
  const draft = useDraft(treeId);
  const title = (draft.data?.definition as { title?: unknown } | undefined)?.title;
  useDocumentTitle(typeof title === 'string' ? `Draft · ${title}` : 'Draft');
  if (draft.isPending) return <LoadingState label="Loading the draft…" />;
  if (draft.isError) {
    return isApiError(draft.error) && draft.error.status === 404 ? (
      <NoDraft treeId={treeId} message={draft.error.message} />
    ) : (
      <ErrorState
        title="Draft not loaded"
        message={draft.error.message}
        onRetry={() => void draft.refetch()}
        retrying={draft.isRefetching}
      />
    );
  }
  return (
    <DraftEditor
      key={draft.data.id}
      treeId={treeId}
      draft={draft.data}
      onPublish={() => void navigate(`/trees/${treeId}/draft/publish`)}
    />
  );
}

export function publishLoader(queryClient: QueryClient) {
  return async ({ request, params }: LoaderFunctionArgs) => {
    await requireArea(queryClient, request, 'trees');
    if (params.treeId) {
      void queryClient.prefetchQuery(draftQueryOptions(params.treeId));
      void queryClient.prefetchQuery(treeQueryOptions(params.treeId));
    }
    return null;
  };
}

export function PublishRoute() {
  const { treeId = '' } = useParams();
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const draft = useDraft(treeId);
  const tree = useTree(treeId);
  useDocumentTitle(tree.data ? `Check and publish · ${tree.data.title}` : 'Check and publish');
  const failed = draft.error ?? tree.error;
  return (
    <div className="flex flex-col gap-6">
      <div>
        <ButtonLink to={`/trees/${treeId}/draft`} variant="quiet" className="-ml-4">
          <span aria-hidden="true">←</span> Back to the editor
        </ButtonLink>
      </div>
      <PageHeader
        title="Check and publish"
        lead={
          tree.data && draft.data
            ? `Draft v${draft.data.version} of “${tree.data.title}”, revision ${draft.data.revision}.`
            : undefined
        }
      />
      {draft.isPending || tree.isPending ? (
        <LoadingState label="Loading the draft…" />
      ) : failed ? (
        isApiError(failed) && failed.status === 404 && draft.isError ? (
          <NoDraft treeId={treeId} message={failed.message} />
        ) : (
          <ErrorState
            title="Draft not loaded"
            message={failed.message}
            onRetry={() => void Promise.all([draft.refetch(), tree.refetch()])}
          />
        )
      ) : draft.data && tree.data ? (
        <PublishDraftPanel
          treeId={treeId}
          title={tree.data.title}
          draft={draft.data}
          regressionCaseIds={tree.data.regressionCaseIds}
          onReloadDraft={() => void draft.refetch()}
          onPublished={(version) =>
            void Promise.resolve(
              navigate(`/trees/${treeId}`, { state: { published: version } }),
            ).then(() => forgetDraft(queryClient, treeId))
          }
        />
      ) : null}
    </div>
  );
}
