import { Inject, Injectable, Logger, type OnApplicationShutdown } from '@nestjs/common';
import type { Request, RequestHandler } from 'express';
import session from 'express-session';
import passport from 'passport';
import type { Pool } from 'pg';
import { COMPUTES_ONLY_PATHS } from '../../common/decorators/computes-only.decorator';
import { AppConfigService } from '../../config/app-config.service';
import { PG_POOL } from '../../database/pg-pool.module';
import { ThrottledTouchPgStore } from './throttled-touch-pg-store';

export const SESSION_COOKIE_NAME = 'lw.sid';
export const SESSION_TABLE = 'session';

/** A request to a compute-only route that brings no session: it needs none. */
function needsNoSession(request: Request): boolean {
  if (request.headers.cookie?.includes(`${SESSION_COOKIE_NAME}=`)) return false;
  const url = request.originalUrl;
  const query = url.indexOf('?');
  return COMPUTES_ONLY_PATHS.has(query === -1 ? url : url.slice(0, query));
}

function unlessSessionless(handler: RequestHandler): RequestHandler {
  return (request, response, next) =>
    needsNoSession(request) ? next() : handler(request, response, next);
}

function promisify(action: (done: (error?: unknown) => void) => void): Promise<void> {
  return new Promise((resolve, reject) => action((error) => (error ? reject(error) : resolve())));
}

/**
 * Server-side sessions in PostgreSQL (connect-pg-simple; the table comes from a migration).
 * Idle timeout: a rolling cookie and store expiry of SESSION_IDLE_MINUTES. Absolute lifetime:
 * the creation time is kept in the session and a session older than SESSION_MAX_HOURS is
 * replaced by an empty one.
 */
@Injectable()
export class HttpSessionService implements OnApplicationShutdown {
  private readonly logger = new Logger(HttpSessionService.name);
  private readonly store: ThrottledTouchPgStore;

  constructor(
    private readonly config: AppConfigService,
    @Inject(PG_POOL) private readonly pool: Pool,
  ) {
    this.store = new ThrottledTouchPgStore({
      pool,
      tableName: SESSION_TABLE,
      createTableIfMissing: false,
      pruneSessionInterval: 15 * 60,
      errorLog: (...args: unknown[]) => this.logger.error(args.map(String).join(' ')),
    });
  }

  get cookieOptions(): { httpOnly: boolean; sameSite: 'lax'; secure: boolean; path: string } {
    return {
      httpOnly: true,
      sameSite: 'lax',
      secure: this.config.secureCookies,
      path: '/',
    };
  }

  /**
   * The middleware chain, in order: session, absolute lifetime, passport. Each step is skipped for
   * a request to a compute-only route that brings no session cookie (it answers a guest anyway).
   */
  middleware(): RequestHandler[] {
    const sessionMiddleware = session({
      name: SESSION_COOKIE_NAME,
      secret: this.config.sessionSecret,
      store: this.store,
      resave: false,
      saveUninitialized: false,
      rolling: true,
      unset: 'destroy',
      cookie: { ...this.cookieOptions, maxAge: this.config.sessionIdleMs },
    });
    const maxAgeMs = this.config.sessionMaxAgeMs;
    const absoluteLifetime: RequestHandler = (request, _response, next) => {
      const createdAtMs = request.session?.createdAtMs;
      if (createdAtMs === undefined || Date.now() - createdAtMs <= maxAgeMs) return next();
      request.session.regenerate((error) => next(error));
    };
    return [sessionMiddleware, absoluteLifetime, passport.initialize(), passport.session()].map(
      unlessSessionless,
    );
  }

  /** Marks a fresh session (after sign-in or register) with its creation time. */
  start(request: Request): void {
    request.session.createdAtMs = Date.now();
  }

  /** Anonymous sessions (a CSRF token only) get a creation time the first time too. */
  ensureStarted(request: Request): void {
    request.session.createdAtMs ??= Date.now();
  }

  destroy(request: Request): Promise<void> {
    return promisify((done) => request.session.destroy(done));
  }

  /** Signs the user out everywhere: deletes every stored session that belongs to them. */
  async destroyAllForUser(userId: string): Promise<void> {
    await this.pool.query(
      `delete from "${SESSION_TABLE}" where sess -> 'passport' ->> 'user' = $1`,
      [userId],
    );
  }

  async onApplicationShutdown(): Promise<void> {
    await this.store.close();
  }
}
