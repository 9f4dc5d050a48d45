import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Booking } from '@/types/api';
import { availabilityQueryKey } from './get-availability';
import { bookingQueryKey } from './get-booking';
import { bookingsQueryKey } from './get-bookings';
import { isBooking } from '../utils/booking-answers';

/** Cancels a booking (a hold is released): it turns `cancelled` and its bays are free again. */
export function cancelBooking(bookingId: string): Promise<Booking> {
  return api.post<Booking>(`/api/bookings/${encodeURIComponent(bookingId)}/cancel`);
}

export function useCancelBooking() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: cancelBooking,
    onSuccess: async (booking, bookingId) => {
      if (isBooking(booking)) queryClient.setQueryData(bookingQueryKey(bookingId), booking);
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: bookingsQueryKey }),
        queryClient.invalidateQueries({ queryKey: availabilityQueryKey }),
      ]);
    },
    // Refused (e.g. already under way): the page is out of date.
    onError: (_error, bookingId) =>
      queryClient.invalidateQueries({ queryKey: bookingQueryKey(bookingId) }),
  });
}
