import type { ComponentType, ReactNode } from 'react';
import { Outlet } from 'react-router';
import type { NavItem } from '@/components/layouts/nav-item';
import { navItemsForRole } from '@/components/layouts/role-navigation';
import { UserMenu } from '@/features/auth/components/user-menu';
import { useUser } from '@/features/auth/hooks/use-user';

interface AreaLayoutProps {
  navItems: readonly NavItem[];
  accountMenu: ReactNode;
  children: ReactNode;
}

/** Puts an area's pages into its layout with the signed-in user's navigation and menu. */
export function SignedInFrame({ layout: Layout }: { layout: ComponentType<AreaLayoutProps> }) {
  const { data: user } = useUser();
  // Only rendered inside RequireRole, which waits for the user.
  if (!user) return null;
  return (
    <Layout navItems={navItemsForRole(user.role)} accountMenu={<UserMenu user={user} />}>
      <Outlet />
    </Layout>
  );
}
