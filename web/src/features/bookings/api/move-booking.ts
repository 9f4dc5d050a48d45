import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Booking, MoveBookingRequest } from '@/types/api';
import { availabilityQueryKey } from './get-availability';
import { bookingQueryKey } from './get-booking';
import { bookingsQueryKey } from './get-bookings';

export interface MoveBookingInput extends MoveBookingRequest {
  bookingId: string;
}

/**
 * Moves a booking to another start: every bay moves or nothing changes (409 with `nextStarts`
 * when the new time is taken). A customer moves only their own held booking.
 */
export function moveBooking({ bookingId, ...body }: MoveBookingInput): Promise<Booking> {
  return api.post<Booking>(`/api/bookings/${encodeURIComponent(bookingId)}/move`, body);
}

export function useMoveBooking() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: moveBooking,
    onSuccess: async (booking) => {
      queryClient.setQueryData(bookingQueryKey(booking.id), booking);
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: [...bookingsQueryKey, 'list'] }),
        queryClient.invalidateQueries({ queryKey: availabilityQueryKey }),
      ]);
    },
    onError: () => queryClient.invalidateQueries({ queryKey: availabilityQueryKey }),
  });
}
