import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { HolidayOverrideRequest, WorkshopSetup } from '@/types/api';
import { setupChanged } from './setup-changed';

export interface SetHolidayOpeningInput extends HolidayOverrideRequest {
  /** The public holiday's local date, YYYY-MM-DD. */
  date: string;
}

/** Manager: opens on a public holiday anyway (usual hours), or closes on it again. */
export function setHolidayOpening({
  date,
  ...body
}: SetHolidayOpeningInput): Promise<WorkshopSetup> {
  return api.put<WorkshopSetup>(`/api/workshop/holidays/${encodeURIComponent(date)}`, body);
}

export function useSetHolidayOpening() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: setHolidayOpening,
    onSuccess: (setup) => setupChanged(queryClient, setup),
  });
}
