import { queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { VehicleModelListResponse, VehicleModelQuery } from '@/types/api';

export const vehicleModelsQueryKey = ['vehicle-models'] as const;

export function getVehicleModels(query: VehicleModelQuery = {}): Promise<VehicleModelListResponse> {
  const search = new URLSearchParams();
  if (query.q?.trim()) search.set('q', query.q.trim());
  if (query.make) search.set('make', query.make);
  if (query.year !== undefined) search.set('year', String(query.year));
  const text = search.toString();
  return api.get<VehicleModelListResponse>(
    text ? `/api/vehicle-models?${text}` : '/api/vehicle-models',
  );
}

export function vehicleModelsQueryOptions(query: VehicleModelQuery = {}) {
  return queryOptions({
    queryKey: [...vehicleModelsQueryKey, 'list', query] as const,
    queryFn: () => getVehicleModels(query),
  });
}
