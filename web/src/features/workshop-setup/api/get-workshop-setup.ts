import { queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { WorkshopSetup } from '@/types/api';

export const workshopSetupQueryKey = ['workshop-setup'] as const;

/**
 * The workshop's calendar set-up: time zone, holiday region, slot step, hold length, lead-time
 * buffer, fitting time, the week's opening hours, bays, closures and the next 12 months of
 * public holidays. Every change answers the whole set-up, which replaces this entry.
 */
export function getWorkshopSetup(): Promise<WorkshopSetup> {
  return api.get<WorkshopSetup>('/api/workshop/setup');
}

export function workshopSetupQueryOptions() {
  return queryOptions({ queryKey: workshopSetupQueryKey, queryFn: getWorkshopSetup });
}
