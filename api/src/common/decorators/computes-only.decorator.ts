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
