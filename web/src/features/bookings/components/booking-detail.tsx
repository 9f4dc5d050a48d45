import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Typography from '@mui/material/Typography';
import EditCalendarOutlined from '@mui/icons-material/EditCalendarOutlined';
import EventBusyOutlined from '@mui/icons-material/EventBusyOutlined';
import CompareArrowsOutlined from '@mui/icons-material/CompareArrowsOutlined';
import AlertTitle from '@mui/material/AlertTitle';
import { useId, useState } from 'react';
import { Link as RouterLink } from 'react-router';
import { paths } from '@/config/paths';
import type { Booking } from '@/types/api';
import { useNow } from '../hooks/use-now';
import {
  bookingMoves,
  confirmedAt,
  formatEventTime,
  moveRequestStatus,
  noteSentence,
  revisionToAnswer,
} from '../utils/booking-history';
import { bookingStateDescriptions, formatLocalDateTime } from '../utils/booking-text';
import { AskToMoveDialog } from './ask-to-move-dialog';
import { BookingStateChip } from './booking-state-chip';
import { CancelBookingDialog } from './cancel-booking-dialog';
import { BookingQuoteRows } from './booking-quote-rows';
import { HoldCountdown } from './hold-countdown';
import { PayDeposit } from './pay-deposit';
import { PaymentLines } from './payment-lines';
import { PayTopUp } from './pay-top-up';
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
 * when the workshop confirmed it and every move ("moved from … to …"), the request to move and
 * where it stands, a revised quote to compare and answer, the difference to pay when the
 * revised deposit is higher, its times and bays on the workshop's clock, its payments, the
 * quote it is for, and what the customer can do with it now.
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
  const { timeZone } = booking;
  const confirmed = confirmedAt(booking);
  const moves = bookingMoves(booking);
  const asked = moveRequestStatus(booking);
  const revision = revisionToAnswer(booking);
  const topUpDue = booking.depositTopUpCents > 0 && !held;

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
          {confirmed && booking.state === 'confirmed' && (
            <Typography color="success.main" sx={{ fontWeight: 500 }}>
              Confirmed by the workshop on {formatEventTime(confirmed, timeZone)}.
            </Typography>
          )}
          {moves.length > 0 && (
            <Box role="region" aria-label="Moves">
              <Typography sx={{ fontWeight: 500 }}>
                {moves.length === 1 ? 'This booking was moved' : `Moved ${moves.length} times`}
              </Typography>
              <Box component="ul" sx={{ m: 0, pl: 2.5 }}>
                {moves.map((move) => (
                  <li key={`${move.at}-${move.detail}`}>
                    <Typography variant="body2">
                      {move.detail}{' '}
                      <Box component="span" sx={{ color: 'text.secondary' }}>
                        ({formatEventTime(move.at, timeZone)})
                      </Box>
                    </Typography>
                  </li>
                ))}
              </Box>
            </Box>
          )}
          {revision !== null && (
            <Alert severity="warning" role="note">
              <AlertTitle>The workshop revised your quote</AlertTitle>
              Version {revision} of quote {booking.quote.reference} waits for your answer. Compare
              it with version {booking.quote.versionNumber}, the one this booking is for, then
              accept or decline it. Accepting keeps this booking.
              <Box sx={{ mt: 1 }}>
                <Button
                  component={RouterLink}
                  to={paths.account.quoteCompare.getHref(booking.quote.id, revision)}
                  variant="contained"
                  color="warning"
                  startIcon={<CompareArrowsOutlined aria-hidden />}
                >
                  Compare the versions
                </Button>
              </Box>
            </Alert>
          )}
          {booking.needsMove && !held && (
            <Alert severity="info" role="note">
              The revised job no longer fits this time. The workshop will move the booking and tell
              you the new time; until then it keeps this one.
            </Alert>
          )}
          {topUpDue && <PayTopUp booking={booking} />}
          {asked.kind === 'waiting' && booking.moveRequest && (
            <Alert severity="info" role="note">
              <AlertTitle>You asked to move this booking</AlertTitle>
              On {formatLocalDateTime(booking.moveRequest.requestedAt, timeZone)}:{' '}
              {noteSentence(booking.moveRequest.note)} Waiting for the workshop: it will move the
              booking and tell you the new time.
            </Alert>
          )}
          {asked.kind === 'moved' && booking.moveRequest && (
            <Alert severity="success" role="note">
              <AlertTitle>Your request to move was answered</AlertTitle>
              You asked on {formatLocalDateTime(booking.moveRequest.requestedAt, timeZone)}:{' '}
              {noteSentence(booking.moveRequest.note)} The workshop moved the booking on{' '}
              {formatEventTime(asked.move.at, timeZone)}; the new time is below.
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
          {/* Each payment is listed once a top-up joins the deposit. */}
          {booking.payments.some((payment) => payment.kind === 'top-up') && (
            <PaymentLines booking={booking} paidOnly />
          )}
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
