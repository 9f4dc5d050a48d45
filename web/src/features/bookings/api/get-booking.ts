import { queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Booking } from '@/types/api';
import { bookingsQueryKey } from './get-bookings';

export function bookingQueryKey(id: string) {
  return [...bookingsQueryKey, 'detail', id] as const;
}

/** One booking (another customer's answers 404). */
export function getBooking(id: string): Promise<Booking> {
  return api.get<Booking>(`/api/bookings/${encodeURIComponent(id)}`);
}

export function bookingQueryOptions(id: string) {
  return queryOptions({ queryKey: bookingQueryKey(id), queryFn: () => getBooking(id) });
}
