import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import CircularProgress from '@mui/material/CircularProgress';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogContentText from '@mui/material/DialogContentText';
import DialogTitle from '@mui/material/DialogTitle';
import { useId } from 'react';
import { isApiError } from '@/lib/api-client';
import { formatCalendarDate } from '@/lib/format';
import { formatCents } from '@/lib/money';
import type { Quote, QuoteVersion } from '@/types/api';
import { useRespondToQuote, type QuoteResponseAction } from '../api/respond-to-quote';

interface Props {
  quote: Quote;
  version: QuoteVersion;
  action: QuoteResponseAction | null;
  onClose: () => void;
}

/** Asks before accepting or declining a version; a refusal (409) is shown in the dialog. */
export function RespondDialog({ quote, version, action, onClose }: Props) {
  const respond = useRespondToQuote();
  const titleId = useId();
  const textId = useId();
  const accepting = action === 'accept';

  const close = () => {
    if (respond.isPending) return;
    respond.reset();
    onClose();
  };

  const confirm = () => {
    if (!action) return;
    respond.mutate(
      { quoteId: quote.id, versionNumber: version.number, action },
      { onSuccess: () => onClose() },
    );
  };

  return (
    <Dialog
      open={action !== null}
      onClose={close}
      aria-labelledby={titleId}
      aria-describedby={textId}
    >
      <DialogTitle id={titleId}>
        {accepting ? 'Accept' : 'Decline'} version {version.number} of quote {quote.reference}?
      </DialogTitle>
      <DialogContent>
        <DialogContentText id={textId}>
          {accepting
            ? `You accept the work and the price of ${formatCents(version.price.totalCents)}, with a deposit of ${formatCents(version.price.depositCents)} when you book. The prices hold until ${formatCalendarDate(version.validUntilDate)}.`
            : 'The workshop will see that you do not want this quote. You can still plan a new build at any time.'}
        </DialogContentText>
        {respond.isError && (
          <Alert severity="error" sx={{ mt: 2 }}>
            {isApiError(respond.error)
              ? respond.error.message
              : 'Your answer could not be sent. Please try again.'}
          </Alert>
        )}
      </DialogContent>
      <DialogActions>
        <Button onClick={close} disabled={respond.isPending}>
          Cancel
        </Button>
        <Button
          variant="contained"
          color={accepting ? 'primary' : 'error'}
          onClick={confirm}
          disabled={respond.isPending}
          startIcon={
            respond.isPending ? (
              <CircularProgress size={18} color="inherit" aria-hidden />
            ) : undefined
          }
        >
          {accepting ? 'Accept' : 'Decline'}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
