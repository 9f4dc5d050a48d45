import { useSearchParams } from 'react-router';
import { safeRedirectPath } from '@/config/paths';

/** The page to return to after signing in, from ?redirectTo=, if it stays on this site. */
export function useRedirectTarget(): string | null {
  const [searchParams] = useSearchParams();
  return safeRedirectPath(searchParams.get('redirectTo'));
}
