import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Typography from '@mui/material/Typography';
import EventBusyOutlined from '@mui/icons-material/EventBusyOutlined';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useId, useState } from 'react';
import { Link as RouterLink } from 'react-router';
import { LoadingScreen } from '@/components/ui/loading-screen';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { formatCents } from '@/lib/money';
import { bookingQueryKey, bookingQueryOptions } from '../api/get-booking';
import { useNow } from '../hooks/use-now';
import { bookingStateLabels, formatLocalDateTime } from '../utils/booking-text';
import { latestPaidPayment, paymentCheckPhase, topUpDue } from '../utils/payment-text';
import { BookingLoadError } from './booking-load-error';
import { BookingStateChip } from './booking-state-chip';
import { CancelBookingDialog } from './cancel-booking-dialog';
import { HoldCountdown } from './hold-countdown';
import { PayDeposit } from './pay-deposit';
import { PayTopUp } from './pay-top-up';
import { PaymentsSummary } from './payments-summary';

/**
 * Where the provider sends a customer who left its page without paying: the booking as the
 * API has it, and while the time is still held, "Try again" (a payment page again) or
 * "Release this time" (the cancel dialog, as on the booking). After leaving the page for a
 * deposit top-up, the difference still due and "Try again"; the booking keeps its time.
 */
export function DepositNotCompleted({ bookingId }: { bookingId: string }) {
  const queryClient = useQueryClient();
  const booking = useQuery({ ...bookingQueryOptions(bookingId), refetchOnMount: 'always' });
  const [releasing, setReleasing] = useState(false);
  const headingId = useId();
  const data = booking.data;
  const holdRunning = data?.state === 'held' && data.holdExpiresAt !== null;
  const now = useNow(1000, holdRunning);

  if (booking.isPending) return <LoadingScreen label="Loading the booking" />;
  if (!data) {
    return <BookingLoadError error={booking.error} onRetry={() => void booking.refetch()} />;
  }
  const held = data.state === 'held';
  const holdOver = held && data.holdExpiresAt !== null && Date.parse(data.holdExpiresAt) <= now;
  // Left the page for the difference a revised quote asks (a top-up): still due, time kept.
  const topUpLeft = topUpDue(data);
  // Paid after all (in another tab, or the page reported late): the booking says so.
  const paid = !topUpLeft && paymentCheckPhase(data, true) === 'received';
  const lastPaid = latestPaidPayment(data.payments);

  return (
    <>
      <PageHeader title={paid ? 'Payment received' : 'Payment not completed'} />
      <Box sx={{ display: 'grid', gap: 3, maxWidth: 720 }}>
        {paid ? (
          <Alert severity="success" role="status">
            {lastPaid?.kind === 'top-up'
              ? `The deposit top-up of ${formatCents(lastPaid.amountCents)} for booking ${data.reference} is paid after all.`
              : `The deposit of ${formatCents(data.depositPaidCents)} for booking ${data.reference} is paid after all.`}{' '}
            The booking is {bookingStateLabels[data.state].toLowerCase()}.
          </Alert>
        ) : topUpLeft ? (
          <Typography>
            The difference of {formatCents(data.depositTopUpCents)} on the deposit of booking{' '}
            {data.reference} has not been paid. The booking keeps its time; you can pay it now or
            from the booking later.
          </Typography>
        ) : held && !holdOver ? (
          <Typography>
            The deposit for booking {data.reference} has not been paid. Your time is still held: try
            again, or let the time go if it no longer suits.
          </Typography>
        ) : (
          <Alert severity="info" role="status">
            The deposit for booking {data.reference} was not paid and its time is no longer held.
          </Alert>
        )}

        <Card component="section" aria-labelledby={headingId}>
          <CardContent sx={{ display: 'grid', gap: 1.5 }}>
            <Box sx={{ display: 'flex', alignItems: 'center', gap: 1, flexWrap: 'wrap' }}>
              <Typography id={headingId} variant="h2" sx={{ fontSize: '1.2rem' }}>
                Booking {data.reference}
              </Typography>
              <BookingStateChip state={data.state} />
            </Box>
            <Typography>
              {formatLocalDateTime(data.startUtc, data.timeZone)}, {data.quote.vehicleName}
            </Typography>
            {held && data.holdExpiresAt && (
              <HoldCountdown
                holdExpiresAt={data.holdExpiresAt}
                onExpired={() =>
                  void queryClient.invalidateQueries({ queryKey: bookingQueryKey(bookingId) })
                }
              />
            )}
            <PaymentsSummary booking={data} />
            {topUpLeft && <PayTopUp booking={data} label="Try again" />}
            {held && !holdOver && (
              <Box sx={{ display: 'grid', gap: 1.5, mt: 1 }}>
                <PayDeposit booking={data} label="Try again" />
                <Box>
                  <Button
                    variant="outlined"
                    color="error"
                    startIcon={<EventBusyOutlined aria-hidden />}
                    onClick={() => setReleasing(true)}
                  >
                    Release this time
                  </Button>
                </Box>
              </Box>
            )}
          </CardContent>
        </Card>

        <Box sx={{ display: 'flex', gap: 1, flexWrap: 'wrap' }}>
          <Button
            component={RouterLink}
            to={paths.account.booking.getHref(data.id)}
            variant="outlined"
          >
            See the booking
          </Button>
          {!paid && !topUpLeft && (!held || holdOver) && (
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
      <CancelBookingDialog booking={data} open={releasing} onClose={() => setReleasing(false)} />
    </>
  );
}
