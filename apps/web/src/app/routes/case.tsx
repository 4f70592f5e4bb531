// /cases/:caseId: the case page. Loaded lazily (see router.tsx): it brings the fault-tree package
// (XState, mathjs) to replay the walk and preview readings in the browser. Open to the roles of
// Cases and to the service advisor, who reads it.
import type { QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router';
import { caseQueryOptions, useCase } from '../../features/cases/api/get-case';
import { CaseWorkspace } from '../../features/cases/components/case-workspace';
import { ButtonLink } from '../../components/ui/button';
import { useMe } from '../../lib/auth';
import { useDocumentTitle } from '../../lib/document-title';
import { getArea, mayRead } from '../areas';
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
  const me = useMe();
  // A diagnosed case's repair order, for those who review it (the advisor and the lead).
  const repairOrder =
    data &&
    (data.status === 'diagnosed' || data.status === 'closed') &&
    mayRead(getArea('findings'), me.role);
  return (
    <div className="flex flex-col gap-4">
      {repairOrder ? (
        <div className="flex flex-wrap items-center justify-between gap-3 rounded-panel border-2 border-primary bg-surface p-3 sm:px-4">
          <p className="font-semibold">
            This case is diagnosed: its findings go into the repair order.
          </p>
          <ButtonLink to={`/cases/${encodeURIComponent(caseId)}/repair-order`} variant="primary">
            Open the repair order
          </ButtonLink>
        </div>
      ) : null}
      <CaseWorkspace key={caseId} caseId={caseId} />
    </div>
  );
}
