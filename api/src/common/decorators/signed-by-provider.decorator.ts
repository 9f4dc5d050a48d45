import { applyDecorators, SetMetadata } from '@nestjs/common';
import { ApiExtension } from '@nestjs/swagger';

export const SIGNED_BY_PROVIDER_KEY = 'liftwright:signedByProvider';

/**
 * A public POST that another server calls (the payment provider's webhook): it brings no
 * session and no CSRF token, and is authenticated instead by the signature over its raw body,
 * which the handler verifies before anything else. The CSRF guard lets it through; the CSRF
 * test checks the list of such routes. Only for @Public() routes that verify a signature.
 */
export const SignedByProvider = () =>
  applyDecorators(
    SetMetadata(SIGNED_BY_PROVIDER_KEY, true),
    ApiExtension('x-signed-by-provider', true),
  );
