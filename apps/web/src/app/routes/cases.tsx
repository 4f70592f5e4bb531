// /cases: the case list (the technician's "My cases", the lead's whole workshop). Filters live in
// the address, so a reload or the back button keeps them; only entering the screen runs the
// loader, so typing in the search box does not navigate.
import type { Role, StaffMember } from '@heatpath/contracts';
import { useQuery, type QueryClient } from '@tanstack/react-query';
import {
  useSearchParams,
  type LoaderFunctionArgs,
  type ShouldRevalidateFunction,
} from 'react-router';
import { ButtonLink } from '../../components/ui/button';
import { PageHeader } from '../../components/ui/page';
import { casesQueryOptions, type CaseListFilters } from '../../features/cases/api/get-cases';
import {
  CaseList,
  isCaseStatus,
  type PersonOption,
} from '../../features/cases/components/case-list';
import { staffQueryOptions } from '../../features/staff/api/get-staff';
import { useMe } from '../../lib/auth';
import { useDocumentTitle } from '../../lib/document-title';
import { areaLabel, getArea } from '../areas';
import { requireArea } from '../guards';

export function caseFiltersFrom(params: URLSearchParams, role: Role): CaseListFilters {
  const scope = params.get('scope');
  const status = params.get('status');
  return {
    scope:
      scope === 'mine' || scope === 'workshop'
        ? scope
        : role === 'technician'
          ? 'mine'
          : 'workshop',
    status: isCaseStatus(status) ? status : undefined,
    technicianId: role === 'lead' ? (params.get('technician') ?? undefined) : undefined,
    q: params.get('q') ?? undefined,
  };
}

export function caseFiltersToParams(filters: CaseListFilters): URLSearchParams {
  const params = new URLSearchParams({ scope: filters.scope });
  if (filters.status) params.set('status', filters.status);
  if (filters.technicianId) params.set('technician', filters.technicianId);
  if (filters.q) params.set('q', filters.q);
  return params;
}

/** The same filters the list asks with: the search as it settles, trimmed. */
export function settledFilters(filters: CaseListFilters): CaseListFilters {
  return { ...filters, q: filters.q?.trim() || undefined };
}

export function technicianOptions(staff: readonly StaffMember[]): PersonOption[] {
  return staff
    .filter((member) => member.active && (member.role === 'technician' || member.role === 'lead'))
    .map((member) => ({ id: member.id, name: member.name }));
}

export function casesLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    const me = await requireArea(queryClient, request, 'cases');
    const filters = caseFiltersFrom(new URL(request.url).searchParams, me.role);
    void queryClient.prefetchInfiniteQuery(casesQueryOptions(settledFilters(filters)));
    // Only a lead may read the staff list; it fills the technician filter.
    if (me.role === 'lead') void queryClient.prefetchQuery(staffQueryOptions());
    return null;
  };
}

export const casesShouldRevalidate: ShouldRevalidateFunction = ({
  currentUrl,
  nextUrl,
  defaultShouldRevalidate,
}) => currentUrl.pathname !== nextUrl.pathname && defaultShouldRevalidate;

export function CasesRoute() {
  const me = useMe();
  const label = areaLabel(getArea('cases'), me.role);
  useDocumentTitle(label);
  const [params, setParams] = useSearchParams();
  const filters = caseFiltersFrom(params, me.role);
  const staff = useQuery({ ...staffQueryOptions(), enabled: me.role === 'lead' });
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title={label}
        lead={
          me.role === 'technician'
            ? 'Your cases first; switch to the whole workshop to find any other.'
            : 'Every case in the workshop, newest first.'
        }
        action={
          <ButtonLink to="/cases/new" variant="primary" size="large">
            New case
          </ButtonLink>
        }
      />
      <CaseList
        filters={filters}
        onFiltersChange={(next) =>
          setParams(caseFiltersToParams(next), { replace: true, preventScrollReset: true })
        }
        technicians={
          me.role === 'lead' && staff.data ? technicianOptions(staff.data.staff) : undefined
        }
        emptyText={
          filters.scope === 'mine'
            ? 'No case is assigned to you. Start one with “New case”.'
            : 'No cases yet. Start one with “New case”.'
        }
      />
    </div>
  );
}
