// /findings: the service advisor's list of diagnosed cases; each opens the case page, read only,
// with its findings, and from there the case's repair order (app/routes/case.tsx links it).
import type { QueryClient } from '@tanstack/react-query';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { PageHeader } from '../../components/ui/page';
import { casesQueryOptions, type CaseListFilters } from '../../features/cases/api/get-cases';
import { CaseList } from '../../features/cases/components/case-list';
import { useDocumentTitle } from '../../lib/document-title';
import { requireArea } from '../guards';
import { casesShouldRevalidate, settledFilters } from './cases';

function findingsFilters(params: URLSearchParams): CaseListFilters {
  return { scope: 'workshop', status: 'diagnosed', q: params.get('q') ?? undefined };
}

export function findingsLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    await requireArea(queryClient, request, 'findings');
    const filters = findingsFilters(new URL(request.url).searchParams);
    void queryClient.prefetchInfiniteQuery(casesQueryOptions(settledFilters(filters)));
    return null;
  };
}

export const findingsShouldRevalidate = casesShouldRevalidate;

export function FindingsRoute() {
  useDocumentTitle('Findings');
  const [params, setParams] = useSearchParams();
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title="Findings"
        lead="Diagnosed cases, newest first. Open one for its concern, cause and correction, parts, labour and follow-ups."
      />
      <CaseList
        filters={findingsFilters(params)}
        onFiltersChange={(next) =>
          setParams(next.q ? { q: next.q } : {}, { replace: true, preventScrollReset: true })
        }
        showScope={false}
        showStatus={false}
        emptyText="No case has been diagnosed yet."
      />
    </div>
  );
}
