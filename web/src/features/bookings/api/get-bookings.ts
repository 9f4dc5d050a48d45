import { queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { BookingListResponse } from '@/types/api';

export const bookingsQueryKey = ['bookings'] as const;

/** A customer's own bookings (staff: every booking), newest first. */
export function getBookings(): Promise<BookingListResponse> {
  return api.get<BookingListResponse>('/api/bookings');
}

export function bookingsQueryOptions() {
  return queryOptions({
    queryKey: [...bookingsQueryKey, 'list'] as const,
    queryFn: getBookings,
  });
}
