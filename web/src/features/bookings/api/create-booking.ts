import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Booking, CreateBookingRequest } from '@/types/api';
import { availabilityQueryKey } from './get-availability';
import { bookingQueryKey } from './get-booking';
import { bookingsQueryKey } from './get-bookings';

/**
 * Holds a start for a quote version (201: a booking in `held`). 409 with `nextStarts` when the
 * time has gone or is not offered; an earlier hold of the same quote is released by the API.
 */
export function createBooking(body: CreateBookingRequest): Promise<Booking> {
  return api.post<Booking>('/api/bookings', body);
}

export function useCreateBooking() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createBooking,
    onSuccess: async (booking) => {
      queryClient.setQueryData(bookingQueryKey(booking.id), booking);
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: [...bookingsQueryKey, 'list'] }),
        queryClient.invalidateQueries({ queryKey: availabilityQueryKey }),
      ]);
    },
    // A refusal means the free times have changed: ask again.
    onError: () => queryClient.invalidateQueries({ queryKey: availabilityQueryKey }),
  });
}
