import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { AdvanceBookingRequest, Booking } from '@/types/api';
import { bookingQueryKey } from './get-booking';
import { bookingsQueryKey } from './get-bookings';
import { isBooking } from '../utils/booking-answers';

export interface AdvanceBookingInput extends AdvanceBookingRequest {
  bookingId: string;
}

/**
 * The desk's next step of a booking: requested → confirmed, confirmed → in-progress (the
 * vehicle is in), in-progress → completed. 409 when the booking is not at the step before.
 */
export function advanceBooking({ bookingId, ...body }: AdvanceBookingInput): Promise<Booking> {
  return api.post<Booking>(`/api/bookings/${encodeURIComponent(bookingId)}/advance`, body);
}

export function useAdvanceBooking() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: advanceBooking,
    onSuccess: async (booking, { bookingId }) => {
      if (isBooking(booking)) queryClient.setQueryData(bookingQueryKey(bookingId), booking);
      await queryClient.invalidateQueries({ queryKey: bookingsQueryKey });
    },
    // Refused: someone else moved it on meanwhile; show it as it now stands.
    onError: (_error, { bookingId }) =>
      queryClient.invalidateQueries({ queryKey: bookingQueryKey(bookingId) }),
  });
}
