// /cases/new: a case for a vehicle, from the front of the car to its first step.
import { useQuery, type QueryClient } from '@tanstack/react-query';
import { useNavigate, type LoaderFunctionArgs } from 'react-router';
import { ButtonLink } from '../../components/ui/button';
import { PageHeader } from '../../components/ui/page';
import { availableTreesQueryOptions } from '../../features/cases/api/get-available-trees';
import { NewCaseForm } from '../../features/cases/components/new-case-form';
import { staffQueryOptions } from '../../features/staff/api/get-staff';
import { useMe } from '../../lib/auth';
import { useDocumentTitle } from '../../lib/document-title';
import { requireArea } from '../guards';
import { technicianOptions } from './cases';

export function newCaseLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    const me = await requireArea(queryClient, request, 'cases');
    void queryClient.prefetchQuery(availableTreesQueryOptions());
    if (me.role === 'lead') void queryClient.prefetchQuery(staffQueryOptions());
    return null;
  };
}

export function NewCaseRoute() {
  useDocumentTitle('New case');
  const me = useMe();
  const navigate = useNavigate();
  const staff = useQuery({ ...staffQueryOptions(), enabled: me.role === 'lead' });
  // A lead may give the case to someone; anyone else's new case is their own.
  const assignees =
    me.role === 'lead' && staff.data
      ? [
          { id: me.id, name: `Me (${me.name})` },
          ...technicianOptions(staff.data.staff).filter((person) => person.id !== me.id),
        ]
      : undefined;
  return (
    <div className="flex flex-col gap-6">
      <div>
        <ButtonLink to="/cases" variant="quiet" className="-ml-4">
          <span aria-hidden="true">←</span> All cases
        </ButtonLink>
      </div>
      <PageHeader
        title="New case"
        lead="Find the vehicle first, so a car already on file is not added twice."
      />
      <NewCaseForm
        assignees={assignees}
        onCreated={(detail) => void navigate(`/cases/${detail.id}`)}
      />
    </div>
  );
}
