import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { UpdateWorkshopCalendarRequest, WorkshopSetup } from '@/types/api';
import { setupChanged } from './setup-changed';

/** Manager: replaces the zone, region, booking settings and all seven days' hours at once. */
export function updateWorkshopCalendar(
  body: UpdateWorkshopCalendarRequest,
): Promise<WorkshopSetup> {
  return api.put<WorkshopSetup>('/api/workshop/calendar', body);
}

export function useUpdateWorkshopCalendar() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateWorkshopCalendar,
    onSuccess: (setup) => setupChanged(queryClient, setup, { timeZoneMayChange: true }),
  });
}
