import { useMutation } from '@tanstack/react-query';
import { paths } from '@/config/paths';
import { api, isApiError, setCsrfToken } from '@/lib/api-client';

/** Ends the session; one that has already ended (401) counts as signed out too. */
export async function signOut(): Promise<void> {
  try {
    await api.post<void>('/api/auth/sign-out');
  } catch (error) {
    if (!(isApiError(error) && error.statusCode === 401)) throw error;
  }
}

/**
 * Ends the session on the server, then reloads the app at the public home page. The full load
 * leaves nothing of the session in memory (cached records, the CSRF token) on a shared counter
 * computer, and no guarded page is left on screen to react to the user disappearing.
 */
export function useSignOut() {
  return useMutation({
    mutationFn: signOut,
    onSuccess: () => {
      setCsrfToken(null);
      window.location.replace(paths.home.getHref());
    },
  });
}
