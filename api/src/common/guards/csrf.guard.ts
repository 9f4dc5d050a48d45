import {
  type CanActivate,
  type ExecutionContext,
  ForbiddenException,
  Injectable,
} from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { csrfSync } from 'csrf-sync';
import type { Request } from 'express';
import { COMPUTES_ONLY_KEY } from '../decorators/computes-only.decorator';
import { IS_PUBLIC_KEY } from '../decorators/public.decorator';
import { SIGNED_BY_PROVIDER_KEY } from '../decorators/signed-by-provider.decorator';

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

/**
 * Global guard: a state-changing request without the session's token is refused with 403. A
 * public route marked @ComputesOnly() (it writes nothing) needs no token, nor does a public
 * route marked @SignedByProvider() (a server-to-server call that proves itself by a signature
 * over its body, which its handler verifies).
 */
@Injectable()
export class CsrfGuard implements CanActivate {
  constructor(private readonly reflector: Reflector) {}

  canActivate(context: ExecutionContext): boolean {
    if (context.getType() !== 'http') return true;
    const request = context.switchToHttp().getRequest<Request>();
    if (SAFE_METHODS.has(request.method)) return true;
    const targets = [context.getHandler(), context.getClass()];
    const isPublic = this.reflector.getAllAndOverride<boolean>(IS_PUBLIC_KEY, targets) === true;
    if (
      isPublic &&
      (this.reflector.getAllAndOverride<boolean>(COMPUTES_ONLY_KEY, targets) === true ||
        this.reflector.getAllAndOverride<boolean>(SIGNED_BY_PROVIDER_KEY, targets) === true)
    ) {
      return true;
    }
    if (request.session && csrf.isRequestValid(request)) return true;
    throw new ForbiddenException(CSRF_ERROR_MESSAGE);
  }
}
