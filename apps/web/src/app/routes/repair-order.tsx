// /cases/:caseId/repair-order: a diagnosed case's repair order — review, edit, approve, export,
// send. Open to the roles of Findings and its readers (the service advisor and the lead).
import type { QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router';
import { repairOrderQueryOptions } from '../../features/repair-order/api/get-repair-order';
import { RepairOrderScreen } from '../../features/repair-order/components/repair-order-screen';
import { useDocumentTitle } from '../../lib/document-title';
import { requireAreaRecord } from '../guards';

export function repairOrderLoader(queryClient: QueryClient) {
  return async ({ request, params }: LoaderFunctionArgs) => {
    await requireAreaRecord(queryClient, request, 'findings');
    if (params.caseId) void queryClient.prefetchQuery(repairOrderQueryOptions(params.caseId));
    return null;
  };
}

export function RepairOrderRoute() {
  const { caseId = '' } = useParams();
  useDocumentTitle('Repair order');
  return <RepairOrderScreen key={caseId} caseId={caseId} />;
}
