import { useMemo } from 'react';
import { Outlet, useMatch } from 'react-router';
import { paths } from '@/config/paths';
import { useUser } from '@/features/auth/hooks/use-user';
import { PLANNER_STORAGE_KEY } from '@/features/planner/forms/build';
import { PlannerFrame } from '@/features/planner/components/planner-frame';
import { PlannerProvider, type PlannerConfig } from '@/features/planner/hooks/use-planner';

/** The customer's planner: open to everyone; saving asks a visitor to register or sign in. */
export default function PlanLayoutRoute() {
  const { data: user } = useUser();
  const role = user?.role ?? null;
  const booking = useMatch(paths.plan.book.path) !== null;
  const config = useMemo<PlannerConfig>(
    () => ({
      storageKey: PLANNER_STORAGE_KEY,
      basePath: paths.plan.path,
      mode: 'customer',
      viewerRole: role,
    }),
    [role],
  );
  return (
    <PlannerProvider config={config}>
      <PlannerFrame showBuild={!booking}>
        <Outlet />
      </PlannerFrame>
    </PlannerProvider>
  );
}
