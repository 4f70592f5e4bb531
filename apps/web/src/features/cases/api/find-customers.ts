// GET /api/customers?q=: customers whose name contains what was typed.
import { customerListSchema } from '@heatpath/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { customersKeys } from '../../../lib/query-keys';

export { customersKeys };

export const minCustomerQuery = 2;

export function findCustomers(q: string, signal?: AbortSignal) {
  return apiRequest(`/api/customers?q=${encodeURIComponent(q)}`, customerListSchema, { signal });
}

export function customerSearchQueryOptions(q: string) {
  return queryOptions({
    queryKey: customersKeys.search(q),
    queryFn: ({ signal }) => findCustomers(q, signal),
  });
}

export function useCustomerSearch(q: string) {
  return useQuery({
    ...customerSearchQueryOptions(q),
    enabled: q.length >= minCustomerQuery,
    placeholderData: keepPreviousData,
  });
}
