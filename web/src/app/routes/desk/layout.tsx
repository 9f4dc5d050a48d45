import type { QueryClient } from '@tanstack/react-query';
import { DeskLayout } from '@/components/layouts/desk-layout';
import { areaRoles } from '@/config/roles';
import { RequireRole } from '@/features/auth/components/require-role';
import { SignedInFrame } from '@/app/signed-in-frame';
import { warmSession } from '@/app/warm-session';

export const clientLoader = (queryClient: QueryClient) => async () => {
  await warmSession(queryClient);
  return null;
};

export default function DeskArea() {
  return (
    <RequireRole allow={areaRoles.desk}>
      <SignedInFrame layout={DeskLayout} />
    </RequireRole>
  );
}
