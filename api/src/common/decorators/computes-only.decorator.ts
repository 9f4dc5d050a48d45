import { applyDecorators, SetMetadata } from '@nestjs/common';
import { ApiExtension } from '@nestjs/swagger';

export const COMPUTES_ONLY_KEY = 'liftwright:computesOnly';

/**
 * A public POST that only computes an answer from its body (a price preview, planner options):
 * it reads, never writes, and answers the same whoever sends it, so a forged cross-site request
 * gains nothing and the CSRF guard lets it through without a session. Only for @Public() routes
 * whose handler changes no state; the CSRF test checks the list of such routes.
 */
export const ComputesOnly = () =>
  applyDecorators(SetMetadata(COMPUTES_ONLY_KEY, true), ApiExtension('x-computes-only', true));

/**
 * The paths of the @ComputesOnly() routes. A request to one of them without a session cookie
 * skips the session middleware altogether: it would only make up a session and throw it away.
 * The CSRF test checks that this list and the decorated routes agree.
 */
export const COMPUTES_ONLY_PATHS: ReadonlySet<string> = new Set([
  '/api/planner/options',
  '/api/quotes/preview',
]);
