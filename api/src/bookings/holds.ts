import type { EntityManager } from '@mikro-orm/postgresql';
import { EXPIRED_DETAIL } from './booking-event-kinds';

/** SQLSTATE of an exclusion-constraint refusal (PostgreSQL, Appendix A: exclusion_violation). */
export const EXCLUSION_VIOLATION = '23P01';

/**
 * The database refused a reservation because it overlaps an active one of the same bay.
 * MikroORM 6 maps no class to 23P01: it arrives as a driver exception carrying the code.
 */
export function isOverlapRefusal(error: unknown): boolean {
  return (
    typeof error === 'object' &&
    error !== null &&
    (error as { code?: unknown }).code === EXCLUSION_VIOLATION
  );
}

/**
 * Marks every hold whose time has run out as expired and releases its bays, in one statement
 * (inside the caller's transaction when there is one). Safe to run from any number of
 * processes at once. Each expired hold gets its audit event (no actor: the system) in the same
 * statement. Returns how many holds expired.
 */
export async function expireLapsedHolds(em: EntityManager, now: Date): Promise<number> {
  const rows = await em.execute<{ id: string }[]>(
    `with lapsed as (
       update booking set state = 'expired', state_changed_at = ?, updated_at = ?
        where state = 'held' and hold_expires_at <= ?
        returning id),
     released as (
       update reservation set active = false, updated_at = ?
        where active and booking_id in (select id from lapsed)),
     logged as (
       insert into booking_event (id, created_at, updated_at, booking_id, at, kind, actor_id, detail)
       select gen_random_uuid(), ?, ?, id, ?, 'expired', null, ? from lapsed)
     select id from lapsed`,
    [now, now, now, now, now, now, now, EXPIRED_DETAIL],
  );
  return rows.length;
}
