import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Booking } from '@/types/api';
import { isBooking } from '../utils/booking-answers';
import { bookingQueryKey } from './get-booking';
import { bookingsQueryKey } from './get-bookings';

/**
 * The desk records that the vehicle is on site (a requested or confirmed booking keeps its
 * state; `arrivedAt` is set and the trail says so). 409 when it was marked already, or the
 * booking is not requested or confirmed.
 */
export function markArrived(bookingId: string): Promise<Booking> {
  return api.post<Booking>(`/api/bookings/${encodeURIComponent(bookingId)}/arrived`);
}

export function useMarkArrived() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: markArrived,
    onSuccess: async (booking, bookingId) => {
      if (isBooking(booking)) queryClient.setQueryData(bookingQueryKey(bookingId), booking);
      await queryClient.invalidateQueries({ queryKey: bookingsQueryKey });
    },
    // Refused: marked meanwhile, or moved on; show it as it now stands.
    onError: (_error, bookingId) =>
      queryClient.invalidateQueries({ queryKey: bookingQueryKey(bookingId) }),
  });
}
