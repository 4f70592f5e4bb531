// /cases/:caseId: the case page. Loaded lazily (see router.tsx): it brings the fault-tree package
// (XState, mathjs) to replay the walk and preview readings in the browser. Open to the roles of
// Cases and to the service advisor, who reads it.
import type { QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router';
import { caseQueryOptions, useCase } from '../../features/cases/api/get-case';
import { CaseWorkspace } from '../../features/cases/components/case-workspace';
import { useDocumentTitle } from '../../lib/document-title';
import { requireAreaRecord } from '../guards';

export function caseLoader(queryClient: QueryClient) {
  return async ({ request, params }: LoaderFunctionArgs) => {
    await requireAreaRecord(queryClient, request, 'cases');
    if (params.caseId) void queryClient.prefetchQuery(caseQueryOptions(params.caseId));
    return null;
  };
}

export function CaseRoute() {
  const { caseId = '' } = useParams();
  const { data } = useCase(caseId);
  useDocumentTitle(data ? `${data.vehicle.plate ?? data.reference} · ${data.reference}` : 'Case');
  // No "back" link: the navigation's own entry (Cases, Findings) is always one tap away, and the
  // height is worth more to the step on a tablet.
  return <CaseWorkspace key={caseId} caseId={caseId} />;
}
