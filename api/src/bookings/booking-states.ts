/**
 * A booking's life: `held` (a time kept for the customer until `holdExpiresAt`), `requested`
 * (deposit paid, waiting for the workshop), `confirmed`, `in-progress`, `completed`, and the two
 * ends without work: `cancelled` and `expired` (a hold nobody took up).
 */
export const BOOKING_STATES = [
  'held',
  'requested',
  'confirmed',
  'in-progress',
  'completed',
  'cancelled',
  'expired',
] as const;
export type BookingState = (typeof BOOKING_STATES)[number];

/** States whose reservations keep their bays. */
export const ACTIVE_BOOKING_STATES: readonly BookingState[] = [
  'held',
  'requested',
  'confirmed',
  'in-progress',
];

export function isActiveBookingState(state: BookingState): boolean {
  return ACTIVE_BOOKING_STATES.includes(state);
}

/** Shown as B-000042. */
export function bookingReference(number: number): string {
  return `B-${String(number).padStart(6, '0')}`;
}
