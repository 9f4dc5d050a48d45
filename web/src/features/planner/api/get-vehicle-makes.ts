import { queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { VehicleMakesResponse } from '@/types/api';

export function getVehicleMakes(): Promise<VehicleMakesResponse> {
  return api.get<VehicleMakesResponse>('/api/vehicle-models/makes');
}

export function vehicleMakesQueryOptions() {
  return queryOptions({
    queryKey: ['vehicle-models', 'makes'] as const,
    queryFn: getVehicleMakes,
    staleTime: 10 * 60_000,
  });
}
