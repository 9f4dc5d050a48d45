import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { AskToMoveRequest, Booking } from '@/types/api';
import { bookingQueryKey } from './get-booking';
import { bookingsQueryKey } from './get-bookings';
import { isBooking } from '../utils/booking-answers';

export interface RequestBookingMoveInput extends AskToMoveRequest {
  bookingId: string;
}

/** Asks the workshop to move a requested or confirmed booking; the note is kept for the desk. */
export function requestBookingMove({
  bookingId,
  ...body
}: RequestBookingMoveInput): Promise<Booking> {
  return api.post<Booking>(`/api/bookings/${encodeURIComponent(bookingId)}/move-request`, body);
}

export function useRequestBookingMove() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: requestBookingMove,
    onSuccess: async (booking, { bookingId }) => {
      if (isBooking(booking)) queryClient.setQueryData(bookingQueryKey(bookingId), booking);
      await queryClient.invalidateQueries({ queryKey: bookingsQueryKey });
    },
  });
}
