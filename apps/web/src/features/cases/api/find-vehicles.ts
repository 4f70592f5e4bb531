// GET /api/vehicles?q=: vehicles whose plate or VIN starts with what was typed, so a car already
// on file is found before anyone adds it twice.
import { vehicleListSchema } from '@heatpath/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { vehiclesKeys } from '../../../lib/query-keys';

export { vehiclesKeys };

/** The API needs two characters before it searches. */
export const minVehicleQuery = 2;

export function findVehicles(q: string, signal?: AbortSignal) {
  return apiRequest(`/api/vehicles?q=${encodeURIComponent(q)}`, vehicleListSchema, { signal });
}

export function vehicleSearchQueryOptions(q: string) {
  return queryOptions({
    queryKey: vehiclesKeys.search(q),
    queryFn: ({ signal }) => findVehicles(q, signal),
  });
}

export function useVehicleSearch(q: string) {
  return useQuery({
    ...vehicleSearchQueryOptions(q),
    enabled: q.length >= minVehicleQuery,
    placeholderData: keepPreviousData,
  });
}
