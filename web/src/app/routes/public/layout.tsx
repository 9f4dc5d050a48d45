import Button from '@mui/material/Button';
import type { QueryClient } from '@tanstack/react-query';
import { Link as RouterLink, Outlet, useLocation } from 'react-router';
import { PublicLayout } from '@/components/layouts/public-layout';
import { paths } from '@/config/paths';
import { homePathForRole, roleHomeLabels } from '@/config/roles';
import { UserMenu } from '@/features/auth/components/user-menu';
import { useUser } from '@/features/auth/hooks/use-user';
import { warmSession } from '@/app/warm-session';

/** Pages that carry their own links between sign-in, register and the password pages. */
const authPages = new Set<string>([
  paths.auth.signIn.path,
  paths.auth.register.path,
  paths.auth.forgotPassword.path,
  paths.auth.resetPassword.path,
]);

function AppBarActions() {
  const { data: user, isPending } = useUser();
  const { pathname } = useLocation();
  if (isPending) return null;
  if (user) {
    return (
      <>
        <Button component={RouterLink} to={homePathForRole(user.role)} color="inherit">
          {roleHomeLabels[user.role]}
        </Button>
        <UserMenu user={user} />
      </>
    );
  }
  if (authPages.has(pathname)) return null;
  return (
    <Button
      component={RouterLink}
      to={paths.auth.signIn.getHref()}
      color="inherit"
      variant="outlined"
      sx={{ borderColor: 'rgba(255, 255, 255, 0.6)' }}
    >
      Sign in
    </Button>
  );
}

/** Knowing who is signed in first keeps the app bar and the sign-in redirect from flickering. */
export const clientLoader = (queryClient: QueryClient) => async () => {
  await warmSession(queryClient);
  return null;
};

export default function PublicArea() {
  return (
    <PublicLayout actions={<AppBarActions />}>
      <Outlet />
    </PublicLayout>
  );
}
