import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, setCsrfToken } from '@/lib/api-client';
import type { AuthSessionResponse, SignInRequest } from '@/types/api';
import { setSignedInUser } from './get-me';

export function signIn(body: SignInRequest): Promise<AuthSessionResponse> {
  return api.post<AuthSessionResponse>('/api/auth/sign-in', body);
}

/** Signs in; the session is regenerated on the server, so its new CSRF token is used from now. */
export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: ({ user, csrfToken }) => {
      setCsrfToken(csrfToken);
      setSignedInUser(queryClient, user);
    },
  });
}
