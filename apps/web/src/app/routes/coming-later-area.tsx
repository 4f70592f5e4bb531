// Screens for areas whose capability is not built yet: the route exists (so the navigation is
// honest and role checks are real) but the page says plainly what will come.
import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { ComingLater } from '../../components/ui/coming-later';
import { PageHeader } from '../../components/ui/page';
import { useMe } from '../../lib/auth';
import { useDocumentTitle } from '../../lib/document-title';
import { areaLabel, getArea, type AreaId } from '../areas';
import { requireArea } from '../guards';

export function comingLaterLoader(queryClient: QueryClient, areaId: AreaId) {
  return async ({ request }: LoaderFunctionArgs) => {
    await requireArea(queryClient, request, areaId);
    return null;
  };
}

export function ComingLaterArea({ areaId }: { areaId: AreaId }) {
  const me = useMe();
  const area = getArea(areaId);
  const label = areaLabel(area, me.role);
  useDocumentTitle(label);
  return (
    <div className="flex flex-col gap-6">
      <PageHeader title={label} />
      <ComingLater capability={area.comingWith ?? label}>
        <p>{area.summary[me.role]}</p>
      </ComingLater>
    </div>
  );
}
