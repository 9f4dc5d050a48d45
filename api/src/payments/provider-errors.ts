import { BadGatewayException, type Logger } from '@nestjs/common';
import Stripe from 'stripe';

/** The provider could not be reached, took too long or failed on its side. */
export function isProviderUnreachable(error: unknown): boolean {
  return (
    error instanceof Stripe.errors.StripeConnectionError ||
    error instanceof Stripe.errors.StripeAPIError ||
    error instanceof Stripe.errors.StripeRateLimitError
  );
}

/** The provider refused an idempotency key used before with other parameters. */
export function isIdempotencyConflict(error: unknown): boolean {
  return error instanceof Stripe.errors.StripeIdempotencyError;
}

/**
 * A 502 with a message for the user (what happened, that nothing changed, what to do); the
 * provider's own message is only logged.
 */
export function providerFailure(
  error: unknown,
  logger: Logger,
  what: { action: string; unchanged: string },
): BadGatewayException {
  const detail = error instanceof Error ? `${error.name}: ${error.message}` : String(error);
  logger.error(`The payment provider failed to ${what.action}: ${detail}`);
  return new BadGatewayException(
    isProviderUnreachable(error)
      ? `The payment provider cannot be reached just now. ${what.unchanged} Try again in a minute.`
      : `The payment provider refused to ${what.action}. ${what.unchanged} Try again later or contact the workshop.`,
  );
}
