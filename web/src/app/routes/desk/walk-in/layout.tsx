import { useMemo } from 'react';
import { Outlet } from 'react-router';
import { paths } from '@/config/paths';
import { useUser } from '@/features/auth/hooks/use-user';
import { WALK_IN_STORAGE_KEY } from '@/features/planner/forms/build';
import { PlannerProvider, type PlannerConfig } from '@/features/planner/hooks/use-planner';

/** The front desk's walk-in quote: choose the customer, then the planner's own steps. */
export default function WalkInLayoutRoute() {
  const { data: user } = useUser();
  const role = user?.role ?? null;
  const config = useMemo<PlannerConfig>(
    () => ({
      storageKey: WALK_IN_STORAGE_KEY,
      basePath: paths.desk.walkIn.path,
      mode: 'walk-in',
      viewerRole: role,
      firstStepBackHref: paths.desk.walkIn.step('customer'),
      customerStepHref: paths.desk.walkIn.step('customer'),
    }),
    [role],
  );
  return (
    <PlannerProvider config={config}>
      <Outlet />
    </PlannerProvider>
  );
}
