import type { QueryClient } from '@tanstack/react-query';
import { meQueryOptions } from '@/features/auth/api/get-me';
import type { User } from '@/types/api';

/**
 * Loads who is signed in before an area renders, so its guard decides at once. A failure is
 * left for the guard to show (with a retry), so this never throws.
 */
export async function warmSession(queryClient: QueryClient): Promise<User | null> {
  try {
    return await queryClient.ensureQueryData(meQueryOptions());
  } catch {
    return null;
  }
}
