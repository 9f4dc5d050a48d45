import type { QueryClient } from '@tanstack/react-query';
import { ManageLayout } from '@/components/layouts/manage-layout';
import { areaRoles } from '@/config/roles';
import { RequireRole } from '@/features/auth/components/require-role';
import { SignedInFrame } from '@/app/signed-in-frame';
import { warmSession } from '@/app/warm-session';

export const clientLoader = (queryClient: QueryClient) => async () => {
  await warmSession(queryClient);
  return null;
};

export default function ManageArea() {
  return (
    <RequireRole allow={areaRoles.manage}>
      <SignedInFrame layout={ManageLayout} />
    </RequireRole>
  );
}
