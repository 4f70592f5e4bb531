// GET /api/staff: the workshop's people, for the lead. Its key is the root every staff mutation
// invalidates.
import { staffListSchema } from '@heatpath/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { staffKeys } from '../../../lib/query-keys';

export { staffKeys };

export function getStaff(signal?: AbortSignal) {
  return apiRequest('/api/staff', staffListSchema, { signal });
}

export function staffQueryOptions() {
  return queryOptions({
    queryKey: staffKeys.list(),
    queryFn: ({ signal }) => getStaff(signal),
  });
}

export function useStaff() {
  return useQuery(staffQueryOptions());
}
