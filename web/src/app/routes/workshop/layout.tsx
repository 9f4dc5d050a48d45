import type { QueryClient } from '@tanstack/react-query';
import { WorkshopLayout } from '@/components/layouts/workshop-layout';
import { areaRoles } from '@/config/roles';
import { RequireRole } from '@/features/auth/components/require-role';
import { SignedInFrame } from '@/app/signed-in-frame';
import { warmSession } from '@/app/warm-session';

export const clientLoader = (queryClient: QueryClient) => async () => {
  await warmSession(queryClient);
  return null;
};

export default function WorkshopArea() {
  return (
    <RequireRole allow={areaRoles.workshop}>
      <SignedInFrame layout={WorkshopLayout} />
    </RequireRole>
  );
}
