import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, setCsrfToken } from '@/lib/api-client';
import type { AuthSessionResponse, RegisterRequest } from '@/types/api';
import { setSignedInUser } from './get-me';

export function register(body: RegisterRequest): Promise<AuthSessionResponse> {
  return api.post<AuthSessionResponse>('/api/auth/register', body);
}

/** Creates a customer account and signs it in (the server regenerates the session). */
export function useRegister() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: register,
    onSuccess: ({ user, csrfToken }) => {
      setCsrfToken(csrfToken);
      setSignedInUser(queryClient, user);
    },
  });
}
