import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import CircularProgress from '@mui/material/CircularProgress';
import Typography from '@mui/material/Typography';
import { useQueryClient } from '@tanstack/react-query';
import { useId } from 'react';
import { Link as RouterLink } from 'react-router';
import { LoadingScreen } from '@/components/ui/loading-screen';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { formatCents } from '@/lib/money';
import type { Booking } from '@/types/api';
import { bookingQueryKey } from '../api/get-booking';
import { useNow } from '../hooks/use-now';
import { usePaymentCheck } from '../hooks/use-payment-check';
import { bookingStateLabels, formatLocalDateTime } from '../utils/booking-text';
import { latestPaidPayment, type PaymentCheckPhase } from '../utils/payment-text';
import { BookingLoadError } from './booking-load-error';
import { BookingStateChip } from './booking-state-chip';
import { HoldCountdown } from './hold-countdown';
import { PayDeposit } from './pay-deposit';
import { PayTopUp } from './pay-top-up';
import { PaymentsSummary } from './payments-summary';

const titles: Record<PaymentCheckPhase, string> = {
  received: 'Payment received',
  waiting: 'Checking your payment',
  'not-heard': 'Checking your payment',
  'not-complete': 'Payment not complete',
  ended: 'This time is no longer held',
};

function PaymentsCard({ booking }: { booking: Booking }) {
  const headingId = useId();
  return (
    <Card component="section" aria-labelledby={headingId}>
      <CardContent>
        <Box sx={{ display: 'flex', alignItems: 'center', gap: 1, flexWrap: 'wrap', mb: 1.5 }}>
          <Typography id={headingId} variant="h2" sx={{ fontSize: '1.2rem' }}>
            Booking {booking.reference}
          </Typography>
          <BookingStateChip state={booking.state} />
        </Box>
        <Typography sx={{ mb: 1.5 }}>
          {formatLocalDateTime(booking.startUtc, booking.timeZone)}, {booking.quote.vehicleName}
        </Typography>
        <PaymentsSummary booking={booking} />
      </CardContent>
    </Card>
  );
}

/** Past `held`, the difference a revised quote asks (a top-up) was not paid: try again. */
function TopUpNotComplete({ booking }: { booking: Booking }) {
  return (
    <Box sx={{ display: 'grid', gap: 2 }}>
      <Alert severity="error" role="status">
        The payment of the difference did not go through, so{' '}
        {formatCents(booking.depositTopUpCents)} is still due on the deposit of booking{' '}
        {booking.reference}. The booking keeps its time.
      </Alert>
      <PayTopUp booking={booking} label="Try again" />
    </Box>
  );
}

/** Still held, no payment page open: try again while the hold runs. */
function NotComplete({ booking, onHoldExpired }: { booking: Booking; onHoldExpired: () => void }) {
  const expiresAt = booking.holdExpiresAt;
  const now = useNow(1000, expiresAt !== null);
  const holdOver = expiresAt !== null && Date.parse(expiresAt) <= now;
  return (
    <Box sx={{ display: 'grid', gap: 2 }}>
      <Alert severity="error" role="status">
        The payment did not go through, so the deposit for booking {booking.reference} is not paid.
        You can try again while the time is held.
      </Alert>
      {expiresAt && <HoldCountdown holdExpiresAt={expiresAt} onExpired={onHoldExpired} />}
      {!holdOver && <PayDeposit booking={booking} label="Try again" />}
    </Box>
  );
}

function PhaseMessage({
  booking,
  phase,
  onRetry,
  onHoldExpired,
}: {
  booking: Booking;
  phase: PaymentCheckPhase;
  onRetry: () => void;
  onHoldExpired: () => void;
}) {
  const lastPaid = latestPaidPayment(booking.payments);
  switch (phase) {
    case 'received':
      if (lastPaid?.kind === 'top-up') {
        return (
          <Alert severity="success" role="status">
            <AlertTitle>
              Deposit top-up of {formatCents(lastPaid.amountCents)} received for booking{' '}
              {booking.reference}
            </AlertTitle>
            The deposit paid is now {formatCents(booking.depositPaidCents)}; the booking is{' '}
            {bookingStateLabels[booking.state].toLowerCase()}. A receipt is on its way to{' '}
            {booking.customer.email}.
          </Alert>
        );
      }
      return (
        <Alert severity="success" role="status">
          <AlertTitle>
            Deposit of {formatCents(booking.depositPaidCents)} received for booking{' '}
            {booking.reference}
          </AlertTitle>
          {booking.state === 'requested'
            ? 'Waiting for the workshop to confirm: the workshop will confirm your time. '
            : `The booking is ${bookingStateLabels[booking.state].toLowerCase()}. `}
          A receipt is on its way to {booking.customer.email}.
        </Alert>
      );
    case 'waiting':
      return (
        <Box role="status" sx={{ display: 'flex', gap: 1.5, alignItems: 'center' }}>
          <CircularProgress size={24} aria-hidden />
          <Typography>
            Waiting to hear from the payment provider. This usually takes a few seconds.
          </Typography>
        </Box>
      );
    case 'not-heard':
      return (
        <Alert
          severity="warning"
          role="status"
          action={
            <Button color="inherit" onClick={onRetry}>
              Retry
            </Button>
          }
        >
          <AlertTitle>We have not heard from the payment provider yet</AlertTitle>
          If you paid, there is no need to pay again: the payment shows on the booking as soon as
          the provider tells us.{' '}
          {booking.state === 'held'
            ? 'Your time stays held meanwhile.'
            : 'Your booking keeps its time meanwhile.'}
        </Alert>
      );
    case 'not-complete':
      return booking.state === 'held' ? (
        <NotComplete booking={booking} onHoldExpired={onHoldExpired} />
      ) : (
        <TopUpNotComplete booking={booking} />
      );
    case 'ended':
      return (
        <Alert severity="info" role="status">
          Booking {booking.reference} is {bookingStateLabels[booking.state].toLowerCase()}, so its
          time is free again. A deposit that was paid after that is refunded in full.
        </Alert>
      );
  }
}

/**
 * Where the provider sends the customer after paying (the deposit, or a top-up of it). The
 * booking is read from the API until it has moved on from `held` with no top-up page open
 * ("Payment received"), or the wait is over ("not heard yet", with a retry), or the latest
 * payment failed (try again while the time is held, or pay the difference again).
 */
export function DepositPaidCheck({ bookingId }: { bookingId: string }) {
  const queryClient = useQueryClient();
  const { booking, phase, retry } = usePaymentCheck(bookingId);

  if (booking.isPending) return <LoadingScreen label="Checking your payment" />;
  // A failed poll keeps the booking last read on screen; only a first read that failed shows.
  const data = booking.data;
  if (!data || !phase) {
    return <BookingLoadError error={booking.error} onRetry={() => void booking.refetch()} />;
  }
  return (
    <>
      <PageHeader title={titles[phase]} />
      <Box sx={{ display: 'grid', gap: 3, maxWidth: 720 }}>
        <PhaseMessage
          booking={data}
          phase={phase}
          onRetry={retry}
          onHoldExpired={() =>
            void queryClient.invalidateQueries({ queryKey: bookingQueryKey(bookingId) })
          }
        />
        <PaymentsCard booking={data} />
        <Box sx={{ display: 'flex', gap: 1, flexWrap: 'wrap' }}>
          <Button
            component={RouterLink}
            to={paths.account.booking.getHref(data.id)}
            variant={phase === 'received' ? 'contained' : 'outlined'}
          >
            See the booking
          </Button>
          {phase === 'ended' && (
            <Button
              component={RouterLink}
              to={paths.plan.book.getHref(data.quote.id)}
              variant="contained"
            >
              Book a new time
            </Button>
          )}
        </Box>
      </Box>
    </>
  );
}
