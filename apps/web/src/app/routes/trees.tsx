// /trees, /trees/:treeId and /trees/:treeId/compare: the lead's tree library, one tree's
// versions, and the difference between two versions. Loaded lazily (see router.tsx) with the
// other tree screens, which bring the fault-tree package.
import type { QueryClient } from '@tanstack/react-query';
import { useLocation, useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { ButtonLink } from '../../components/ui/button';
import { PageHeader } from '../../components/ui/page';
import { ErrorState, LoadingState } from '../../components/ui/status';
import { treeDiffQueryOptions } from '../../features/trees/api/get-tree-diff';
import { treeQueryOptions, useTree } from '../../features/trees/api/get-tree';
import { treeLibraryQueryOptions } from '../../features/trees/api/get-tree-library';
import { TreeDiffView } from '../../features/trees/components/tree-diff-view';
import { TreeLibrary } from '../../features/trees/components/tree-library';
import { TreeOverview } from '../../features/trees/components/tree-overview';
import { useDocumentTitle } from '../../lib/document-title';
import { requireArea } from '../guards';

export function treesLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    await requireArea(queryClient, request, 'trees');
    void queryClient.prefetchQuery(treeLibraryQueryOptions());
    return null;
  };
}

export function TreesRoute() {
  useDocumentTitle('Decision trees');
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title="Decision trees"
        lead="The workshop’s order of checks for each symptom. Edit a draft, try it, replay solved cases against it, then publish it as a new version."
      />
      <TreeLibrary />
    </div>
  );
}

export function treeLoader(queryClient: QueryClient) {
  return async ({ request, params }: LoaderFunctionArgs) => {
    await requireArea(queryClient, request, 'trees');
    if (params.treeId) void queryClient.prefetchQuery(treeQueryOptions(params.treeId));
    return null;
  };
}

function BackToTrees() {
  return (
    <div>
      <ButtonLink to="/trees" variant="quiet" className="-ml-4">
        <span aria-hidden="true">←</span> All trees
      </ButtonLink>
    </div>
  );
}

export function TreeRoute() {
  const { treeId = '' } = useParams();
  const location = useLocation();
  const tree = useTree(treeId);
  useDocumentTitle(tree.data?.title ?? 'Decision tree');
  const published = (location.state as { published?: number } | null)?.published;
  return (
    <div className="flex flex-col gap-6">
      <BackToTrees />
      {tree.isPending ? (
        <LoadingState label="Loading the tree…" />
      ) : tree.isError ? (
        <ErrorState
          title="Tree not loaded"
          message={tree.error.message}
          onRetry={() => void tree.refetch()}
          retrying={tree.isRefetching}
        />
      ) : (
        <TreeOverview tree={tree.data} justPublished={published} />
      )}
    </div>
  );
}

export function compareLoader(queryClient: QueryClient) {
  return async ({ request, params }: LoaderFunctionArgs) => {
    await requireArea(queryClient, request, 'trees');
    const search = new URL(request.url).searchParams;
    const from = search.get('from');
    const to = search.get('to');
    if (params.treeId) {
      void queryClient.prefetchQuery(treeQueryOptions(params.treeId));
      if (from && to) void queryClient.prefetchQuery(treeDiffQueryOptions(params.treeId, from, to));
    }
    return null;
  };
}

export function CompareRoute() {
  const { treeId = '' } = useParams();
  const [search] = useSearchParams();
  const tree = useTree(treeId);
  useDocumentTitle(tree.data ? `Compare versions · ${tree.data.title}` : 'Compare versions');
  return (
    <div className="flex flex-col gap-6">
      <div>
        <ButtonLink to={`/trees/${treeId}`} variant="quiet" className="-ml-4">
          <span aria-hidden="true">←</span> Versions of {tree.data?.title ?? 'the tree'}
        </ButtonLink>
      </div>
      <PageHeader title="Compare versions" lead={tree.data ? tree.data.title : undefined} />
      {tree.isPending ? (
        <LoadingState label="Loading the tree…" />
      ) : tree.isError ? (
        <ErrorState
          title="Tree not loaded"
          message={tree.error.message}
          onRetry={() => void tree.refetch()}
          retrying={tree.isRefetching}
        />
      ) : (
        <TreeDiffView
          treeId={treeId}
          versions={[...tree.data.versions].sort((a, b) => b.version - a.version)}
          from={search.get('from') ?? ''}
          to={search.get('to') ?? ''}
        />
      )}
    </div>
  );
}
