import { queryOptions, type QueryClient } from '@tanstack/react-query';
import { api, isApiError } from '@/lib/api-client';
import type { MeResponse, User } from '@/types/api';

export const meQueryKey = ['auth', 'me'] as const;

/** The signed-in user, or null for a visitor (the API answers 401). */
export async function getMe(): Promise<User | null> {
  try {
    const { user } = await api.get<MeResponse>('/api/auth/me');
    return user;
  } catch (error) {
    if (isApiError(error) && error.statusCode === 401) return null;
    throw error;
  }
}

export function meQueryOptions() {
  return queryOptions({
    queryKey: meQueryKey,
    queryFn: getMe,
    staleTime: 5 * 60_000,
  });
}

/**
 * Records who is signed in after sign-in, register or sign-out. Everything cached for the
 * previous session is dropped so one person's data never shows to the next.
 */
export function setSignedInUser(queryClient: QueryClient, user: User | null): void {
  queryClient.removeQueries({
    predicate: (query) =>
      query.queryKey[0] !== meQueryKey[0] || query.queryKey[1] !== meQueryKey[1],
  });
  queryClient.setQueryData(meQueryKey, user);
}
