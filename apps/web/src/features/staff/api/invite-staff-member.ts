// POST /api/staff/invitations: the lead invites a person by e-mail; the link in it sets their
// password. POST /api/staff/:userId/invitation sends a fresh link to someone still invited.
import { staffMemberSchema, type InviteStaffRequest } from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { staffKeys } from '../../../lib/query-keys';

export function inviteStaffMember(body: InviteStaffRequest) {
  return apiRequest('/api/staff/invitations', staffMemberSchema, { method: 'POST', body });
}

export function resendInvitation(userId: string) {
  return apiRequest(`/api/staff/${encodeURIComponent(userId)}/invitation`, staffMemberSchema, {
    method: 'POST',
  });
}

export function useInviteStaffMember() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: inviteStaffMember,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: staffKeys.all }),
  });
}

export function useResendInvitation() {
  return useMutation({ mutationFn: resendInvitation });
}
