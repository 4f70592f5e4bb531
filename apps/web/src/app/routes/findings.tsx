// /findings: the service advisor's queue of diagnosed cases; each opens its repair order, where
// the findings are reviewed, approved, exported and sent.
import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { PageHeader } from '../../components/ui/page';
import { reviewQueueQueryOptions } from '../../features/repair-order/api/get-review-queue';
import { ReviewQueue } from '../../features/repair-order/components/review-queue';
import { useDocumentTitle } from '../../lib/document-title';
import { requireArea } from '../guards';
import { casesShouldRevalidate } from './cases';

export function findingsLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    await requireArea(queryClient, request, 'findings');
    void queryClient.prefetchInfiniteQuery(reviewQueueQueryOptions());
    return null;
  };
}

// The search lives in the screen, not the address: only entering the screen runs the loader.
export const findingsShouldRevalidate = casesShouldRevalidate;

export function FindingsRoute() {
  useDocumentTitle('Findings');
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title="Findings"
        lead="Diagnosed cases, newest first. Open one to review its findings for the repair order, approve them, download them and send them to the customer."
      />
      <ReviewQueue />
    </div>
  );
}
