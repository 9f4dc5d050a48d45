/**
 * What happened to a booking, as its audit trail records it: `held` (a time kept), `deposit-paid`,
 * `requested` (waiting for the workshop), `confirmed`, `moved`, `move-requested` (the customer
 * asked), `arrived` (the vehicle is on site), `started` (work begun), `completed`, `cancelled`, `expired` (the hold ran out),
 * `top-up-paid`, `revision-sent` and `revision-declined` (the desk sent a revised quote; the
 * customer turned it down), `re-planned` (a revised quote was accepted) and `needs-move` (the revised job
 * no longer fits its time).
 */
export const BOOKING_EVENT_KINDS = [
  'held',
  'deposit-paid',
  'requested',
  'confirmed',
  'moved',
  'move-requested',
  'arrived',
  'started',
  'completed',
  'cancelled',
  'expired',
  'top-up-paid',
  'revision-sent',
  'revision-declined',
  're-planned',
  'needs-move',
] as const;
export type BookingEventKind = (typeof BOOKING_EVENT_KINDS)[number];

/** The detail written when the hold sweep (or any reader) expires a lapsed hold. */
export const EXPIRED_DETAIL =
  'The held time ran out before the deposit was paid; its bays were released.';
