// /staff: the lead manages the workshop's people.
import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { PageHeader } from '../../components/ui/page';
import { staffQueryOptions } from '../../features/staff/api/get-staff';
import { StaffDirectory } from '../../features/staff/components/staff-directory';
import { useDocumentTitle } from '../../lib/document-title';
import { requireArea } from '../guards';

export function staffLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    await requireArea(queryClient, request, 'staff');
    // Start the request now but do not wait for it: the screen opens at once with its own
    // loading state, and a failure is shown there with a retry instead of blocking navigation.
    void queryClient.prefetchQuery(staffQueryOptions());
    return null;
  };
}

export function StaffRoute() {
  useDocumentTitle('Staff');
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title="Staff"
        lead="Everyone who can sign in to this workshop. A deactivated person cannot sign in; the work they did stays under their name."
      />
      <StaffDirectory />
    </div>
  );
}
