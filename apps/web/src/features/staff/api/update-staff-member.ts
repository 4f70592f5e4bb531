// PATCH /api/staff/:userId: change a person's role, name or whether they may sign in.
import { staffMemberSchema, type UpdateStaffRequest } from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { staffKeys } from '../../../lib/query-keys';

export interface UpdateStaffMemberInput {
  userId: string;
  changes: UpdateStaffRequest;
}

export function updateStaffMember({ userId, changes }: UpdateStaffMemberInput) {
  return apiRequest(`/api/staff/${encodeURIComponent(userId)}`, staffMemberSchema, {
    method: 'PATCH',
    body: changes,
  });
}

export function useUpdateStaffMember() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateStaffMember,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: staffKeys.all }),
  });
}
