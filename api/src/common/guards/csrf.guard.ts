import {
  type CanActivate,
  type ExecutionContext,
  ForbiddenException,
  Injectable,
} from '@nestjs/common';
import { csrfSync } from 'csrf-sync';
import type { Request } from 'express';

export const CSRF_HEADER = 'x-csrf-token';
export const CSRF_ERROR_MESSAGE = 'Missing or invalid CSRF token';

/**
 * Synchroniser tokens (csrf-sync): one token per session, stored in the session, sent back by
 * the client in the x-csrf-token header of every POST, PUT, PATCH and DELETE.
 */
const csrf = csrfSync({
  ignoredMethods: ['GET', 'HEAD', 'OPTIONS'],
  getTokenFromRequest: (request) => {
    const header = request.headers[CSRF_HEADER];
    return typeof header === 'string' ? header : undefined;
  },
  size: 32,
});

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/** The session's token, created when missing; `renew` replaces it (after sign-in). */
export function issueCsrfToken(request: Request, renew = false): string {
  return csrf.generateToken(request, renew);
}

/** Global guard: a state-changing request without the session's token is refused with 403. */
@Injectable()
export class CsrfGuard implements CanActivate {
  canActivate(context: ExecutionContext): boolean {
    if (context.getType() !== 'http') return true;
    const request = context.switchToHttp().getRequest<Request>();
    if (SAFE_METHODS.has(request.method)) return true;
    if (request.session && csrf.isRequestValid(request)) return true;
    throw new ForbiddenException(CSRF_ERROR_MESSAGE);
  }
}
