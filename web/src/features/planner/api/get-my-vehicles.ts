import { queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { CustomerVehicleListResponse } from '@/types/api';

export const myVehiclesQueryKey = ['my', 'vehicles'] as const;

/** The signed-in customer's own vehicles. */
export function getMyVehicles(): Promise<CustomerVehicleListResponse> {
  return api.get<CustomerVehicleListResponse>('/api/my/vehicles');
}

export function myVehiclesQueryOptions() {
  return queryOptions({ queryKey: myVehiclesQueryKey, queryFn: getMyVehicles });
}
