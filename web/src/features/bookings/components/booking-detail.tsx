import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Typography from '@mui/material/Typography';
import EditCalendarOutlined from '@mui/icons-material/EditCalendarOutlined';
import EventBusyOutlined from '@mui/icons-material/EventBusyOutlined';
import { useId, useState } from 'react';
import { Link as RouterLink } from 'react-router';
import { paths } from '@/config/paths';
import type { Booking } from '@/types/api';
import { useNow } from '../hooks/use-now';
import { bookingStateDescriptions, formatLocalDateTime } from '../utils/booking-text';
import { AskToMoveDialog } from './ask-to-move-dialog';
import { BookingStateChip } from './booking-state-chip';
import { CancelBookingDialog } from './cancel-booking-dialog';
import { BookingQuoteRows } from './booking-quote-rows';
import { HoldCountdown } from './hold-countdown';
import { PayDeposit } from './pay-deposit';
import { PaymentsSummary } from './payments-summary';
import { PickAnotherTimeDialog } from './pick-another-time-dialog';
import { StartDetails } from './start-details';

interface Props {
  booking: Booking;
  /** The quote's own page. */
  quoteHref: string;
  /** The hold ran out on screen: ask the API for the booking as it now stands. */
  onHoldExpired: () => void;
}

type OpenDialog = 'move' | 'release' | 'ask-to-move' | 'cancel' | null;

/**
 * One booking: its state in words (with a live countdown while held, and the deposit to pay),
 * its times and bays on the workshop's clock, its payments, the quote it is for, and what the
 * customer can do with it now.
 */
export function BookingDetail({ booking, quoteHref, onHoldExpired }: Props) {
  const [dialog, setDialog] = useState<OpenDialog>(null);
  const [askSent, setAskSent] = useState(false);
  const statusHeadingId = useId();
  const timesHeadingId = useId();
  const quoteHeadingId = useId();
  const paymentsHeadingId = useId();
  const held = booking.state === 'held';
  const holdRunning = held && booking.holdExpiresAt !== null;
  // Ticks each second only while a hold runs, to hide the hold's actions as it runs out.
  const now = useNow(1000, holdRunning);
  const holdOver =
    held && booking.holdExpiresAt !== null && Date.parse(booking.holdExpiresAt) <= now;
  const movable = booking.state === 'requested' || booking.state === 'confirmed';
  const bookAgain = booking.state === 'expired' || holdOver;
  const depositToPay =
    held &&
    !holdOver &&
    booking.depositDueCents > 0 &&
    booking.depositPaidCents < booking.depositDueCents;
  const close = () => setDialog(null);

  return (
    <Box sx={{ display: 'grid', gap: 3 }}>
      <Card component="section" aria-labelledby={statusHeadingId}>
        <CardContent sx={{ display: 'grid', gap: 1.5 }}>
          <Box sx={{ display: 'flex', alignItems: 'center', gap: 1, flexWrap: 'wrap' }}>
            <Typography id={statusHeadingId} variant="h2" sx={{ fontSize: '1.2rem' }}>
              Status
            </Typography>
            <BookingStateChip state={booking.state} />
          </Box>
          <Typography>{bookingStateDescriptions[booking.state]}</Typography>
          {held && booking.holdExpiresAt && (
            <HoldCountdown holdExpiresAt={booking.holdExpiresAt} onExpired={onHoldExpired} />
          )}
          {booking.moveRequest && (
            <Alert severity="info" role="note">
              You asked to move this booking on{' '}
              {formatLocalDateTime(booking.moveRequest.requestedAt, booking.timeZone)}: “
              {booking.moveRequest.note}”. The workshop will get back to you.
            </Alert>
          )}
          {askSent && !booking.moveRequest && (
            <Alert severity="success" role="status">
              Your request was sent to the workshop.
            </Alert>
          )}
          {depositToPay && <PayDeposit booking={booking} />}
          <Box sx={{ display: 'flex', gap: 1, flexWrap: 'wrap' }}>
            {held && !holdOver && (
              <>
                <Button
                  variant={depositToPay ? 'outlined' : 'contained'}
                  startIcon={<EditCalendarOutlined aria-hidden />}
                  onClick={() => setDialog('move')}
                >
                  Pick another time
                </Button>
                <Button
                  variant="outlined"
                  color="error"
                  startIcon={<EventBusyOutlined aria-hidden />}
                  onClick={() => setDialog('release')}
                >
                  Release this time
                </Button>
              </>
            )}
            {movable && (
              <>
                <Button
                  variant="outlined"
                  startIcon={<EditCalendarOutlined aria-hidden />}
                  onClick={() => setDialog('ask-to-move')}
                >
                  Ask to move
                </Button>
                <Button
                  variant="outlined"
                  color="error"
                  startIcon={<EventBusyOutlined aria-hidden />}
                  onClick={() => setDialog('cancel')}
                >
                  Cancel booking
                </Button>
              </>
            )}
            {bookAgain && (
              <Button
                component={RouterLink}
                to={paths.plan.book.getHref(booking.quote.id)}
                variant="contained"
              >
                Book a new time
              </Button>
            )}
          </Box>
        </CardContent>
      </Card>

      <Card component="section" aria-labelledby={timesHeadingId}>
        <CardContent>
          <StartDetails
            startUtc={booking.startUtc}
            endUtc={booking.endUtc}
            segments={booking.segments}
            timeZone={booking.timeZone}
            headingComponent="h2"
            headingId={timesHeadingId}
            title="Times and bays"
          />
        </CardContent>
      </Card>

      <Card component="section" aria-labelledby={paymentsHeadingId}>
        <CardContent>
          <Typography id={paymentsHeadingId} variant="h2" sx={{ fontSize: '1.2rem', mb: 1.5 }}>
            Payments
          </Typography>
          <PaymentsSummary booking={booking} />
        </CardContent>
      </Card>

      <Card component="section" aria-labelledby={quoteHeadingId}>
        <CardContent>
          <Typography id={quoteHeadingId} variant="h2" sx={{ fontSize: '1.2rem', mb: 1.5 }}>
            The quote
          </Typography>
          <BookingQuoteRows booking={booking} quoteHref={quoteHref} />
        </CardContent>
      </Card>

      {held && <PickAnotherTimeDialog booking={booking} open={dialog === 'move'} onClose={close} />}
      <CancelBookingDialog
        booking={booking}
        open={dialog === 'release' || dialog === 'cancel'}
        onClose={close}
      />
      {movable && (
        <AskToMoveDialog
          booking={booking}
          open={dialog === 'ask-to-move'}
          onClose={close}
          onSent={() => {
            setAskSent(true);
            close();
          }}
        />
      )}
    </Box>
  );
}
