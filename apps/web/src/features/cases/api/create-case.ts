// POST /api/cases: opens a case on the latest published version of the chosen tree.
import { caseDetailSchema, type CreateCaseRequest } from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { casesKeys } from '../../../lib/query-keys';
import { customersKeys } from '../../../lib/query-keys';

export function createCase(body: CreateCaseRequest) {
  return apiRequest('/api/cases', caseDetailSchema, { method: 'POST', body });
}

export function useCreateCase() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createCase,
    onSuccess: (detail) => {
      queryClient.setQueryData(casesKeys.detail(detail.id), detail);
      void queryClient.invalidateQueries({ queryKey: casesKeys.lists() });
      void queryClient.invalidateQueries({ queryKey: customersKeys.all });
    },
  });
}
