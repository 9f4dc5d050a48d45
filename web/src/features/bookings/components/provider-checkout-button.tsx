import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import CircularProgress from '@mui/material/CircularProgress';
import Typography from '@mui/material/Typography';
import CreditCardOutlined from '@mui/icons-material/CreditCardOutlined';
import type { UseMutationResult } from '@tanstack/react-query';
import { useId, useState } from 'react';
import { visuallyHidden } from '@/components/ui/visually-hidden';
import type { DepositCheckout } from '@/types/api';
import { checkoutAddress } from '../utils/payment-text';

/**
 * A button that asks the API for the payment provider's page (a deposit or a top-up) and leaves
 * for it. It stays busy until the page has gone; a refusal or an address this site will not open
 * is shown under it.
 */
export function ProviderCheckoutButton({
  checkout,
  bookingId,
  label,
  note,
  refusalText,
}: {
  checkout: UseMutationResult<DepositCheckout, unknown, string>;
  bookingId: string;
  label: string;
  /** What the customer should know before paying (shown under the button). */
  note: string;
  /** The refusal in words. */
  refusalText: (error: unknown) => string;
}) {
  const [unusableAddress, setUnusableAddress] = useState(false);
  const noteId = useId();
  // Once the address is in hand the page is leaving: the button stays busy until it has gone.
  const leaving = checkout.isSuccess && !unusableAddress;
  const busy = checkout.isPending || leaving;

  const pay = () => {
    setUnusableAddress(false);
    // The promise, not a mutate callback: the page may re-render this button away while lists
    // refresh, and a mutate callback of an unmounted component never runs.
    checkout
      .mutateAsync(bookingId)
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
        {label}
      </Button>
      <Typography id={noteId} variant="body2" color="text.secondary">
        {note}
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
