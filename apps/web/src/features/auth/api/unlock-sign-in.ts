// POST /api/auth/unlock: the link from a "sign-in was paused" e-mail lifts the pause on sign-in
// from browsers the person has not used before. It works once.
import { unlockSignInResponseSchema, type UnlockSignInRequest } from '@heatpath/contracts';
import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

export function unlockSignIn(body: UnlockSignInRequest) {
  return apiRequest('/api/auth/unlock', unlockSignInResponseSchema, { method: 'POST', body });
}

export function useUnlockSignIn() {
  return useMutation({ mutationFn: unlockSignIn });
}
