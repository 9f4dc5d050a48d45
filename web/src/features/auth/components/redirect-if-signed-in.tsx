import type { ReactNode } from 'react';
import { Navigate } from 'react-router';
import { landingPathFor } from '@/config/roles';
import { LoadingScreen } from '@/components/ui/loading-screen';
import { useRedirectTarget } from '../hooks/use-redirect-target';
import { useUser } from '../hooks/use-user';

/**
 * For sign-in and register: a signed-in user goes on to the page they came for, or to their
 * role's home. This is also what moves a user on right after they sign in or register.
 */
export function RedirectIfSignedIn({ children }: { children: ReactNode }) {
  const { data: user, isPending } = useUser();
  const redirectTo = useRedirectTarget();
  if (isPending) return <LoadingScreen />;
  if (user) return <Navigate to={landingPathFor(user.role, redirectTo)} replace />;
  return children;
}
