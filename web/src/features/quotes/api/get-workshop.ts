import { queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { WorkshopCard } from '@/types/api';

/** The workshop's card: name, address, phone and its time zone (dates are shown in it). */
export function getWorkshop(): Promise<WorkshopCard> {
  return api.get<WorkshopCard>('/api/workshop');
}

export function workshopQueryOptions() {
  return queryOptions({
    queryKey: ['workshop'] as const,
    queryFn: getWorkshop,
    staleTime: 30 * 60_000,
  });
}
