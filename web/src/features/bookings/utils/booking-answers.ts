import { isApiError } from '@/lib/api-client';
import type { Booking, BookingConflict } from '@/types/api';

/** An answer that is a booking as it now stands (the cache may take it as it is). */
export function isBooking(value: unknown): value is Booking {
  return typeof value === 'object' && value !== null && 'id' in value && 'state' in value;
}

/**
 * The API's 409 on holding or moving a time: why, and the next free starts (up to five).
 * Null for any other error, so the caller shows it as it is.
 */
export function bookingConflictOf(error: unknown): BookingConflict | null {
  if (!isApiError(error) || error.statusCode !== 409) return null;
  const body = error.body;
  if (typeof body !== 'object' || body === null) return null;
  const nextStarts = (body as { nextStarts?: unknown }).nextStarts;
  if (!Array.isArray(nextStarts)) return null;
  return body as BookingConflict;
}
