import type { QueryClient } from '@tanstack/react-query';
import { useQuery } from '@tanstack/react-query';
import { useMemo } from 'react';
import { warmSession } from '@/app/warm-session';
import { productsQueryOptions } from '@/features/catalogue/api/get-products';
import { CatalogueScreen } from '@/features/catalogue/components/catalogue-screen';
import { vehicleModelsQueryOptions } from '@/features/vehicles/api/get-vehicle-models';
import { vehicleName, yearsText } from '@/features/vehicles/forms/vehicle-model-fields';

export const clientLoader = (queryClient: QueryClient) => async () => {
  const user = await warmSession(queryClient);
  if (user?.role === 'manager') {
    await Promise.all([
      queryClient.prefetchQuery(productsQueryOptions({ includeInactive: true })),
      queryClient.prefetchQuery(vehicleModelsQueryOptions()),
    ]);
  }
  return null;
};

export default function CatalogueRoute() {
  // The product editor offers the vehicle models a product can be marked as made for.
  const vehicles = useQuery(vehicleModelsQueryOptions());
  const vehicleOptions = useMemo(
    () =>
      (vehicles.data?.items ?? []).map((vehicle) => ({
        id: vehicle.id,
        label: `${vehicleName(vehicle)} (${yearsText(vehicle)})`,
      })),
    [vehicles.data],
  );
  return <CatalogueScreen vehicleOptions={vehicleOptions} />;
}
