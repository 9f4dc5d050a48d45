import { isApiError } from '@/lib/api-client';
import type { Booking } from '@/types/api';
import { useStartTopUpCheckout } from '../api/start-top-up-checkout';
import { payTopUpLabel } from '../utils/payment-text';
import { ProviderCheckoutButton } from './provider-checkout-button';

function refusalText(error: unknown): string {
  if (!isApiError(error)) return 'Please try again.';
  if (error.message) return error.message;
  return error.statusCode === 409
    ? 'Nothing more is due on this booking’s deposit.'
    : 'The payment provider could not be reached. Please try again in a moment.';
}

/**
 * The top-up a revised quote's higher deposit asks for: "Pay the difference" asks the API for
 * the provider's payment page (the same checkout as the deposit) and leaves for it. A refusal
 * is shown in the API's words and the booking is read again.
 */
export function PayTopUp({ booking, label }: { booking: Booking; label?: string }) {
  const checkout = useStartTopUpCheckout();
  return (
    <ProviderCheckoutButton
      checkout={checkout}
      bookingId={booking.id}
      label={label ?? payTopUpLabel(booking.depositTopUpCents)}
      note="The revised quote asks a higher deposit than you paid. You pay the difference on the payment provider’s own page, not on this site; your booking keeps its time meanwhile."
      refusalText={refusalText}
    />
  );
}
