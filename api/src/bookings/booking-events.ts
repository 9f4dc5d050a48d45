import type { EntityManager } from '@mikro-orm/postgresql';
import { User } from '../users/entities/user.entity';
import type { BookingEventKind } from './booking-event-kinds';
import { BookingEvent } from './entities/booking-event.entity';
import type { Booking } from './entities/booking.entity';

/**
 * Adds a line to the booking's audit trail in `em`'s unit of work: it is written with the
 * caller's next flush, in the caller's transaction, so the trail has exactly the changes that
 * were committed. `actor` null: the system or the payment provider.
 */
export function recordBookingEvent(
  em: EntityManager,
  booking: Booking,
  kind: BookingEventKind,
  detail: string,
  actor: { id: string } | null,
  at: Date = new Date(),
): BookingEvent {
  const event = new BookingEvent({
    booking,
    at,
    kind,
    // A reference in this unit of work (the signed-in user was loaded by another one).
    actor: actor ? em.getReference(User, actor.id) : null,
    detail,
  });
  em.persist(event);
  return event;
}

/** "3 h 30 min", "45 min", "2 h". */
export function minutesInWords(minutes: number): string {
  const hours = Math.floor(minutes / 60);
  const rest = minutes % 60;
  if (hours === 0) return `${rest} min`;
  return rest === 0 ? `${hours} h` : `${hours} h ${rest} min`;
}

/** A plan's bay time in words: "hoist bay 3 h 30 min, tyre bay 1 h". */
export function bayTimeInWords(plan: {
  segments: readonly { bayKind: string; minutes: number }[];
}): string {
  if (plan.segments.length === 0) return 'no bay time';
  return plan.segments
    .map((segment) => `${segment.bayKind} bay ${minutesInWords(segment.minutes)}`)
    .join(', ');
}

/** Whether two plans take the same bays for the same minutes, in the same order. */
export function sameBayTime(
  a: { segments: readonly { bayKind: string; minutes: number }[] },
  b: { segments: readonly { bayKind: string; minutes: number }[] },
): boolean {
  return (
    a.segments.length === b.segments.length &&
    a.segments.every(
      (segment, index) =>
        segment.bayKind === b.segments[index].bayKind &&
        segment.minutes === b.segments[index].minutes,
    )
  );
}
