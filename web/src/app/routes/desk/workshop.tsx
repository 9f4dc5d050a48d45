import type { QueryClient } from '@tanstack/react-query';
import { warmSession } from '@/app/warm-session';
import { workshopSetupQueryOptions } from '@/features/workshop-setup/api/get-workshop-setup';
import { WorkshopSetupScreen } from '@/features/workshop-setup/components/workshop-setup-screen';

export const clientLoader = (queryClient: QueryClient) => async () => {
  const user = await warmSession(queryClient);
  if (user?.role === 'desk' || user?.role === 'manager') {
    await queryClient.prefetchQuery(workshopSetupQueryOptions());
  }
  return null;
};

/** The front desk reads the workshop's calendar; a manager changes it under Manage. */
export default function DeskWorkshopRoute() {
  return <WorkshopSetupScreen readOnly />;
}
