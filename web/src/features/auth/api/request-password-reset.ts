import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { PasswordResetRequest } from '@/types/api';

/** Always answers 202: whether the account exists is not revealed. */
export function requestPasswordReset(body: PasswordResetRequest): Promise<void> {
  return api.post<void>('/api/auth/password-reset', body);
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}
