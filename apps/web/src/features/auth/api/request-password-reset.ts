// POST /api/auth/password-reset: asks for a link to set a new password. The answer is the same
// whether or not an account uses the address.
import { passwordResetResponseSchema, type PasswordResetRequest } from '@heatpath/contracts';
import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

export function requestPasswordReset(body: PasswordResetRequest) {
  return apiRequest('/api/auth/password-reset', passwordResetResponseSchema, {
    method: 'POST',
    body,
  });
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}
