import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import type { ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router';
import { paths } from '@/config/paths';
import { homePathForRole } from '@/config/roles';
import { LoadingScreen } from '@/components/ui/loading-screen';
import type { Role } from '@/types/api';
import { useUser } from '../hooks/use-user';

interface Props {
  /** Roles that may see the children; the server enforces the same on its routes. */
  allow: readonly Role[];
  children: ReactNode;
}

/**
 * Shows its children only to a signed-in user with one of the allowed roles. A visitor goes to
 * sign in (and comes back here afterwards); a user with another role goes to their own home.
 */
export function RequireRole({ allow, children }: Props) {
  const { data: user, isPending, isError, refetch, isRefetching } = useUser();
  const location = useLocation();

  if (isPending) return <LoadingScreen label="Checking your sign-in" />;
  if (isError) {
    return (
      <Box sx={{ p: 3, maxWidth: 560, mx: 'auto' }}>
        <Alert
          severity="error"
          action={
            <Button color="inherit" onClick={() => refetch()} disabled={isRefetching}>
              Try again
            </Button>
          }
        >
          We could not check whether you are signed in.
        </Alert>
      </Box>
    );
  }
  if (!user) {
    const returnTo = `${location.pathname}${location.search}${location.hash}`;
    return <Navigate to={paths.auth.signIn.getHref(returnTo)} replace />;
  }
  if (!allow.includes(user.role)) return <Navigate to={homePathForRole(user.role)} replace />;
  return children;
}
