// POST /api/staff: the lead adds a person with a role and a first password.
import { staffMemberSchema, type CreateStaffRequest } from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { staffKeys } from '../../../lib/query-keys';

export function createStaffMember(body: CreateStaffRequest) {
  return apiRequest('/api/staff', staffMemberSchema, { method: 'POST', body });
}

export function useCreateStaffMember() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createStaffMember,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: staffKeys.all }),
  });
}
