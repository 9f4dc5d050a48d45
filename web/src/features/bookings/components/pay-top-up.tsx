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
import { useStartTopUpCheckout } from '../api/start-top-up-checkout';
import { checkoutAddress, payTopUpLabel } from '../utils/payment-text';

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
  const [unusableAddress, setUnusableAddress] = useState(false);
  const noteId = useId();
  const leaving = checkout.isSuccess && !unusableAddress;
  const busy = checkout.isPending || leaving;

  const pay = () => {
    setUnusableAddress(false);
    // The promise, not the mutate callback: the page may re-render this button away while the
    // lists refresh, and a mutate callback of an unmounted component never runs.
    checkout
      .mutateAsync(booking.id)
      .then((answer) => {
        const address = checkoutAddress(answer.checkoutUrl);
        if (address) window.location.assign(address);
        else setUnusableAddress(true);
      })
      .catch(() => {
        // Shown from checkout.error below.
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
        {label ?? payTopUpLabel(booking.depositTopUpCents)}
      </Button>
      <Typography id={noteId} variant="body2" color="text.secondary">
        The revised quote asks a higher deposit than you paid. You pay the difference on the payment
        provider’s own page, not on this site; your booking keeps its time meanwhile.
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
