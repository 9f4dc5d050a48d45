import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';

const PgStore = connectPgSimple(session);

/** How often a session's stored expiry is renewed at most (the cookie's rolls on every answer). */
export const SESSION_TOUCH_INTERVAL_MS = 60_000;
/** Sessions whose last renewal is remembered; past this the memory starts afresh. */
const TOUCHED_SESSIONS_KEPT = 10_000;

/**
 * connect-pg-simple writes the new expiry to PostgreSQL on every request of a rolling session.
 * This store writes it at most once a minute per session, so a busy visitor costs one read per
 * request instead of a read and a write. The stored expiry may then trail the cookie's by up to
 * a minute: a session can end up to a minute before its idle timeout, never after.
 */
export class ThrottledTouchPgStore extends PgStore {
  private readonly touchedAt = new Map<string, number>();

  override touch(sid: string, sessionData: session.SessionData, done?: (error?: unknown) => void) {
    const now = Date.now();
    const last = this.touchedAt.get(sid);
    if (last !== undefined && now - last < SESSION_TOUCH_INTERVAL_MS) {
      done?.();
      return;
    }
    if (this.touchedAt.size >= TOUCHED_SESSIONS_KEPT) this.touchedAt.clear();
    this.touchedAt.set(sid, now);
    super.touch(sid, sessionData, done);
  }

  override set(sid: string, sessionData: session.SessionData, done?: (error?: unknown) => void) {
    this.touchedAt.set(sid, Date.now());
    super.set(sid, sessionData, done);
  }

  override destroy(sid: string, done?: (error?: unknown) => void) {
    this.touchedAt.delete(sid);
    super.destroy(sid, done);
  }
}
