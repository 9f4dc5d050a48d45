import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import CircularProgress from '@mui/material/CircularProgress';
import Typography from '@mui/material/Typography';
import CreditCardOutlined from '@mui/icons-material/CreditCardOutlined';
import { useId, useState } from 'react';
import { visuallyHidden } from '@/components/ui/visually-hidden';
import { isApiError } from '@/lib/api-client';
import type { Booking } from '@/types/api';
import { useStartDepositCheckout } from '../api/start-deposit-checkout';
import { checkoutAddress, payDepositLabel } from '../utils/payment-text';

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
  const [unusableAddress, setUnusableAddress] = useState(false);
  const noteId = useId();
  // Once the address is in hand the page is leaving: the button stays busy until it has gone.
  const leaving = checkout.isSuccess && !unusableAddress;
  const busy = checkout.isPending || leaving;

  const pay = () => {
    setUnusableAddress(false);
    checkout.mutate(booking.id, {
      onSuccess: (answer) => {
        const address = checkoutAddress(answer.checkoutUrl);
        if (address) window.location.assign(address);
        else setUnusableAddress(true);
      },
    });
  };

  return (
    <Box sx={{ display: 'grid', gap: 1, justifyItems: 'start' }}>
      <Button
        variant="contained"
        onClick={pay}
        disabled={busy}
        aria-busy={busy || undefined}
        aria-describedby={noteId}
        startIcon={
          busy ? (
            <CircularProgress size={18} color="inherit" aria-hidden />
          ) : (
            <CreditCardOutlined aria-hidden />
          )
        }
      >
        {label ?? payDepositLabel(booking.depositDueCents)}
      </Button>
      <Typography id={noteId} variant="body2" color="text.secondary">
        You pay on the payment provider’s own page, not on this site. Your time stays held while
        that page is open.
      </Typography>
      <Box role="status" sx={visuallyHidden}>
        {leaving ? 'Opening the payment page…' : ''}
      </Box>
      {(checkout.isError || unusableAddress) && (
        <Alert severity="error" sx={{ justifySelf: 'stretch' }}>
          <AlertTitle>The payment page did not open</AlertTitle>
          {unusableAddress
            ? 'The payment provider sent an address this site cannot open. Please try again.'
            : refusalText(checkout.error)}
        </Alert>
      )}
    </Box>
  );
}
