import { isApiError } from '@/lib/api-client';
import type { Booking } from '@/types/api';
import { useStartDepositCheckout } from '../api/start-deposit-checkout';
import { payDepositLabel } from '../utils/payment-text';
import { ProviderCheckoutButton } from './provider-checkout-button';

interface Props {
  booking: Booking;
  /** The button's words; "Pay the deposit ($1,000.00)" unless given. */
  label?: string;
}

function refusalText(error: unknown): string {
  if (!isApiError(error)) return 'Please try again.';
  if (error.message) return error.message;
  return error.statusCode === 409
    ? 'This booking is not waiting for its deposit any more.'
    : 'The payment provider could not be reached. Please try again in a moment.';
}

/**
 * A held booking's deposit: asks the API for the provider's payment page, then leaves for it.
 * A refusal (409: no longer held, the hold lapsed, already paid; 502: the provider is out of
 * reach) is shown here in the API's words, and the booking above is read again.
 */
export function PayDeposit({ booking, label }: Props) {
  const checkout = useStartDepositCheckout();
  return (
    <ProviderCheckoutButton
      checkout={checkout}
      bookingId={booking.id}
      label={label ?? payDepositLabel(booking.depositDueCents)}
      note="You pay on the payment provider’s own page, not on this site. Your time stays held while that page is open."
      refusalText={refusalText}
    />
  );
}
