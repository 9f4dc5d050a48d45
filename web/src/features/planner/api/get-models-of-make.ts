import { queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { VehicleModelListResponse } from '@/types/api';

/** The models and variants of one make, for the planner's vehicle step. */
export function getModelsOfMake(make: string): Promise<VehicleModelListResponse> {
  return api.get<VehicleModelListResponse>(
    `/api/vehicle-models?${new URLSearchParams({ make }).toString()}`,
  );
}

export function modelsOfMakeQueryOptions(make: string) {
  return queryOptions({
    // The same key the catalogue's vehicle list uses for this query, so the two share a cache.
    queryKey: ['vehicle-models', 'list', { make }] as const,
    queryFn: () => getModelsOfMake(make),
    staleTime: 10 * 60_000,
  });
}
