import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import CircularProgress from '@mui/material/CircularProgress';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogContentText from '@mui/material/DialogContentText';
import DialogTitle from '@mui/material/DialogTitle';
import Typography from '@mui/material/Typography';
import { useId } from 'react';
import { isApiError } from '@/lib/api-client';
import { cancellationPolicyText, refundNowText } from '@/lib/cancellation-policy';
import type { Booking } from '@/types/api';
import { useCancelBooking } from '../api/cancel-booking';
import { formatLocalDateTime } from '../utils/booking-text';
import { depositHeldCents, openPayment } from '../utils/payment-text';

interface Props {
  booking: Booking;
  open: boolean;
  onClose: () => void;
  /** The front desk cancels for the customer: the text speaks of them, not to them. */
  forDesk?: boolean;
}

/**
 * Asks before releasing a hold or cancelling a booking, stating the workshop's cancellation
 * rule and what cancelling now would refund (the API's figure); a refusal is shown here.
 */
export function CancelBookingDialog({ booking, open, onClose, forDesk = false }: Props) {
  const cancel = useCancelBooking();
  const titleId = useId();
  const textId = useId();
  const policyId = useId();
  const held = booking.state === 'held';
  const when = formatLocalDateTime(booking.startUtc, booking.timeZone);
  const policy = booking.cancellationPolicy;
  const paymentPageOpen = held && openPayment(booking.payments) !== null;

  const close = () => {
    if (cancel.isPending) return;
    cancel.reset();
    onClose();
  };

  return (
    <Dialog
      open={open}
      onClose={close}
      aria-labelledby={titleId}
      aria-describedby={`${textId} ${policyId}`}
    >
      <DialogTitle id={titleId}>
        {held ? 'Release this time?' : `Cancel booking ${booking.reference}?`}
      </DialogTitle>
      <DialogContent>
        <DialogContentText id={textId}>
          {forDesk
            ? `${booking.customer.name}'s ${held ? 'hold on' : 'booking for'} ${when} is let go straight away and the bays are free again. The quote stays as it is. Any refund the policy allows is paid back through the payment provider.`
            : held
              ? `${when} is let go straight away, and others can book it. Your quote stays as it is, so you can book another time.`
              : `The workshop will no longer expect your vehicle on ${when}. Your quote stays as it is.`}
        </DialogContentText>
        <Typography id={policyId} component="div" sx={{ mt: 2, display: 'grid', gap: 1 }}>
          <span>{cancellationPolicyText(policy)}</span>
          <strong>
            {refundNowText({
              refundIfCancelledNowCents: policy.refundIfCancelledNowCents,
              heldCents: depositHeldCents(booking),
            })}
          </strong>
          {paymentPageOpen && (
            <span>
              If the payment page is still open, close it without paying: a deposit paid after the
              time is released is refunded in full.
            </span>
          )}
        </Typography>
        {cancel.isError && (
          <Alert severity="error" sx={{ mt: 2 }}>
            {isApiError(cancel.error)
              ? cancel.error.message
              : 'The booking could not be cancelled. Please try again.'}
          </Alert>
        )}
      </DialogContent>
      <DialogActions sx={{ px: 3, pb: 2, flexWrap: 'wrap', gap: 1 }}>
        <Button onClick={close} disabled={cancel.isPending}>
          {held ? 'Keep the time' : 'Keep the booking'}
        </Button>
        <Button
          variant="contained"
          color="error"
          disabled={cancel.isPending}
          onClick={() => cancel.mutate(booking.id, { onSuccess: () => onClose() })}
          startIcon={
            cancel.isPending ? (
              <CircularProgress size={18} color="inherit" aria-hidden />
            ) : undefined
          }
        >
          {held ? 'Release this time' : 'Cancel booking'}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
