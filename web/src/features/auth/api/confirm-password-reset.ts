import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { PasswordResetConfirmRequest } from '@/types/api';

export function confirmPasswordReset(body: PasswordResetConfirmRequest): Promise<void> {
  return api.post<void>('/api/auth/password-reset/confirm', body);
}

export function useConfirmPasswordReset() {
  return useMutation({ mutationFn: confirmPasswordReset });
}
