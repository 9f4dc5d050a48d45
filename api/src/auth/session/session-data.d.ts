import 'express-session';

declare module 'express-session' {
  interface SessionData {
    /** When this session was created (ms since epoch), for the absolute lifetime. */
    createdAtMs: number;
    /** Written by passport: only the user's id is kept in the session. */
    passport: { user: string };
  }
}
