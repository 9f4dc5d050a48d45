import type { QueryClient } from '@tanstack/react-query';
import { warmSession } from '@/app/warm-session';
import { useUser } from '@/features/auth/hooks/use-user';
import { workshopSetupQueryOptions } from '@/features/workshop-setup/api/get-workshop-setup';
import { WorkshopSetupScreen } from '@/features/workshop-setup/components/workshop-setup-screen';

export const clientLoader = (queryClient: QueryClient) => async () => {
  const user = await warmSession(queryClient);
  if (user?.role === 'manager') await queryClient.prefetchQuery(workshopSetupQueryOptions());
  return null;
};

export default function WorkshopSetupRoute() {
  const { data: user } = useUser();
  return <WorkshopSetupScreen readOnly={user?.role !== 'manager'} />;
}
