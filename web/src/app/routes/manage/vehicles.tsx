import type { QueryClient } from '@tanstack/react-query';
import { warmSession } from '@/app/warm-session';
import { vehicleModelsQueryOptions } from '@/features/vehicles/api/get-vehicle-models';
import { VehiclesScreen } from '@/features/vehicles/components/vehicles-screen';

export const clientLoader = (queryClient: QueryClient) => async () => {
  const user = await warmSession(queryClient);
  if (user?.role === 'manager') await queryClient.prefetchQuery(vehicleModelsQueryOptions());
  return null;
};

export default function VehiclesRoute() {
  return <VehiclesScreen />;
}
