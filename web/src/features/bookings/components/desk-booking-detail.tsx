import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Chip from '@mui/material/Chip';
import CircularProgress from '@mui/material/CircularProgress';
import Link from '@mui/material/Link';
import Typography from '@mui/material/Typography';
import CheckCircleOutline from '@mui/icons-material/CheckCircleOutline';
import EditCalendarOutlined from '@mui/icons-material/EditCalendarOutlined';
import EventAvailableOutlined from '@mui/icons-material/EventAvailableOutlined';
import EventBusyOutlined from '@mui/icons-material/EventBusyOutlined';
import HandymanOutlined from '@mui/icons-material/HandymanOutlined';
import LocalShippingOutlined from '@mui/icons-material/LocalShippingOutlined';
import RateReviewOutlined from '@mui/icons-material/RateReviewOutlined';
import { useId, useState, type ReactNode } from 'react';
import { Link as RouterLink } from 'react-router';
import { isApiError } from '@/lib/api-client';
import type { AdvanceBookingRequest, Booking, BookingState } from '@/types/api';
import { useAdvanceBooking } from '../api/advance-booking';
import { useMarkArrived } from '../api/mark-arrived';
import { formatEventTime, moveRequestStatus, newerQuoteVersion } from '../utils/booking-history';
import { bookingStateLabels, formatLocalTime } from '../utils/booking-text';
import { BookingAuditTrail } from './booking-audit-trail';
import { BookedFitReport, QuotePhotos, type QuoteLoad } from './booking-quote-facts';
import { BookingStateChip } from './booking-state-chip';
import { CancelBookingDialog } from './cancel-booking-dialog';
import { BookingQuoteRows } from './booking-quote-rows';
import { DetailList, DetailRow } from './detail-list';
import { PaymentLines } from './payment-lines';
import { PaymentsSummary } from './payments-summary';
import { PickAnotherTimeDialog } from './pick-another-time-dialog';
import { StartDetails } from './start-details';

interface Props {
  booking: Booking;
  /** The desk's page of the booking's quote (every version). */
  quoteHref: string;
  /** The planner revising the quote. */
  reviseHref: string;
  /** The quote itself (fit report, photos), loaded by the route. */
  quoteLoad: QuoteLoad;
}

/** What the desk does next from each state, and how the button says it. */
const nextSteps: Partial<
  Record<BookingState, { state: AdvanceBookingRequest['state']; label: string; icon: ReactNode }>
> = {
  requested: {
    state: 'confirmed',
    label: 'Confirm',
    icon: <EventAvailableOutlined aria-hidden />,
  },
  confirmed: {
    state: 'in-progress',
    label: 'Vehicle in, start work',
    icon: <HandymanOutlined aria-hidden />,
  },
  'in-progress': {
    state: 'completed',
    label: 'Complete',
    icon: <CheckCircleOutline aria-hidden />,
  },
};

/** What each state means for the desk, in one line. */
const deskStateText: Record<BookingState, string> = {
  held: 'The customer is holding this time while they pay the deposit.',
  requested: 'Deposit paid. Confirm the time, or move it first.',
  confirmed: 'Confirmed: the vehicle is expected at this time.',
  'in-progress': 'The vehicle is in and the work is under way.',
  completed: 'The work is done.',
  cancelled: 'Cancelled: its bays are free again.',
  expired: 'The hold ran out before the deposit was paid.',
};

const MOVABLE: readonly BookingState[] = ['held', 'requested', 'confirmed'];
/** States in which the desk records the vehicle's arrival (the state itself stays). */
const ARRIVABLE: readonly BookingState[] = ['requested', 'confirmed'];
const CANCELLABLE: readonly BookingState[] = ['held', 'requested', 'confirmed', 'in-progress'];
/** States in which revising the quote can still change the job. */
const REVISABLE: readonly BookingState[] = ['held', 'requested', 'confirmed', 'in-progress'];

/** The newer version's state for the desk, in one sentence. */
function newerVersionText(booking: Booking, number: number, state: string): string {
  const booked = `The booking stays on version ${booking.quote.versionNumber}`;
  switch (state) {
    case 'sent':
      return `Version ${number} (revised) awaits the customer’s answer. ${booked} until they accept it.`;
    case 'declined':
      return `The customer declined version ${number}. ${booked}.`;
    case 'draft':
      return `Version ${number} is a draft, not sent yet. ${booked}.`;
    case 'expired':
      return `Version ${number} expired without an answer. ${booked}.`;
    default:
      return `The quote has a version ${number}. ${booked}.`;
  }
}

function Section({ title, children }: { title: string; children: ReactNode }) {
  const headingId = useId();
  return (
    <Card component="section" aria-labelledby={headingId}>
      <CardContent>
        <Typography id={headingId} variant="h2" sx={{ fontSize: '1.2rem', mb: 1.5 }}>
          {title}
        </Typography>
        {children}
      </CardContent>
    </Card>
  );
}

/**
 * One booking as the front desk works it. First what needs the desk: a booking that must be
 * moved (a revised quote no longer fits its time) and the customer's request to move, each with
 * a Move button. Then the state and the steps that come next (confirm; mark the vehicle
 * arrived; start work; complete), move and cancel; the times and bays; the audit trail.
 * Beside them the customer, the quote (its version, a newer revision, "Revise quote"), the fit
 * report and photos of the booked version, and the payments with each top-up.
 */
export function DeskBookingDetail({ booking, quoteHref, reviseHref, quoteLoad }: Props) {
  const [dialog, setDialog] = useState<'move' | 'cancel' | null>(null);
  const advance = useAdvanceBooking();
  const arrive = useMarkArrived();
  const statusHeadingId = useId();
  const timesHeadingId = useId();
  const step = nextSteps[booking.state];
  // Once the vehicle is marked in, the next step is only to start the work.
  const next =
    step && booking.state === 'confirmed' && booking.arrivedAt
      ? { ...step, label: 'Start work' }
      : step;
  const arrivable = ARRIVABLE.includes(booking.state) && !booking.arrivedAt;
  const movable = MOVABLE.includes(booking.state);
  const cancellable = CANCELLABLE.includes(booking.state);
  const revisable = REVISABLE.includes(booking.state);
  const { timeZone } = booking;
  const close = () => setDialog(null);
  const advancedTo = advance.isSuccess ? advance.data.state : null;
  const refusal = advance.error ?? arrive.error;
  const moveAsked = moveRequestStatus(booking);
  const newer = newerQuoteVersion(booking);
  const needsMove = movable ? booking.needsMove : null;
  const resetActions = () => {
    advance.reset();
    arrive.reset();
  };
  const openMove = () => {
    resetActions();
    setDialog('move');
  };

  return (
    <Box
      sx={{
        display: 'grid',
        gap: 3,
        gridTemplateColumns: { xs: 'minmax(0, 1fr)', lg: 'minmax(0, 3fr) minmax(0, 2fr)' },
        alignItems: 'start',
      }}
    >
      {(needsMove || moveAsked.kind !== 'none') && (
        <Box
          role="region"
          aria-label="Needs the desk"
          sx={{ gridColumn: '1 / -1', display: 'grid', gap: 1.5 }}
        >
          {needsMove && (
            <Alert severity="error" variant="outlined" sx={{ bgcolor: 'background.paper' }}>
              <AlertTitle>Needs a move: the revised job no longer fits this time</AlertTitle>
              <Typography>{needsMove.reason}</Typography>
              <Typography variant="body2" sx={{ mt: 0.5 }}>
                Since {formatEventTime(needsMove.since, timeZone)}. The booking keeps its present
                bays until you move it.
              </Typography>
              <Button
                variant="contained"
                color="error"
                startIcon={<EditCalendarOutlined aria-hidden />}
                onClick={openMove}
                sx={{ mt: 1.5 }}
              >
                Move to a time that fits
              </Button>
            </Alert>
          )}
          {moveAsked.kind === 'waiting' && booking.moveRequest && (
            <Alert severity="warning" variant="outlined" sx={{ bgcolor: 'background.paper' }}>
              <AlertTitle>The customer asks to move it</AlertTitle>
              <Typography sx={{ fontSize: '1.05rem' }}>“{booking.moveRequest.note}”</Typography>
              <Typography variant="body2" sx={{ mt: 0.5 }}>
                Asked {formatEventTime(booking.moveRequest.requestedAt, timeZone)}.
              </Typography>
              {movable && !needsMove && (
                <Button
                  variant="contained"
                  color="warning"
                  startIcon={<EditCalendarOutlined aria-hidden />}
                  onClick={openMove}
                  sx={{ mt: 1.5 }}
                >
                  Move it
                </Button>
              )}
            </Alert>
          )}
          {moveAsked.kind === 'moved' && booking.moveRequest && (
            <Alert severity="success" role="note">
              The customer asked to move it on{' '}
              {formatEventTime(booking.moveRequest.requestedAt, timeZone)} (“
              {booking.moveRequest.note}”). {moveAsked.move.detail}
            </Alert>
          )}
          {moveAsked.kind === 'closed' && booking.moveRequest && (
            <Alert severity="info" role="note">
              The customer asked to move it on{' '}
              {formatEventTime(booking.moveRequest.requestedAt, timeZone)} (“
              {booking.moveRequest.note}”); the booking is now{' '}
              {bookingStateLabels[booking.state].toLowerCase()}.
            </Alert>
          )}
        </Box>
      )}

      <Box sx={{ display: 'grid', gap: 3, minWidth: 0 }}>
        <Card component="section" aria-labelledby={statusHeadingId}>
          <CardContent sx={{ display: 'grid', gap: 1.5 }}>
            <Box sx={{ display: 'flex', alignItems: 'center', gap: 1, flexWrap: 'wrap' }}>
              <Typography id={statusHeadingId} variant="h2" sx={{ fontSize: '1.2rem' }}>
                Status
              </Typography>
              <BookingStateChip state={booking.state} />
              {needsMove && <Chip size="small" color="error" label="Needs a move" />}
              {moveAsked.kind === 'waiting' && (
                <Chip size="small" color="warning" variant="outlined" label="Move requested" />
              )}
            </Box>
            <Typography>{deskStateText[booking.state]}</Typography>
            {booking.state === 'held' && booking.holdExpiresAt && (
              <Typography color="warning.dark" sx={{ fontWeight: 500 }}>
                Held until {formatLocalTime(booking.holdExpiresAt, timeZone)}
              </Typography>
            )}
            {advancedTo && (
              <Alert severity="success" role="status">
                Booking {booking.reference} is now {bookingStateLabels[advancedTo].toLowerCase()}.
              </Alert>
            )}
            {booking.arrivedAt && (
              <Typography sx={{ fontWeight: 500 }}>
                Vehicle in since {formatEventTime(booking.arrivedAt, timeZone)}.
              </Typography>
            )}
            {refusal && (
              <Alert severity="error">
                <AlertTitle>The booking was not changed</AlertTitle>
                {isApiError(refusal) ? refusal.message : 'Please try again.'}
              </Alert>
            )}
            {(next || arrivable || movable || cancellable) && (
              <Box
                role="group"
                aria-label="Actions"
                sx={{ display: 'flex', gap: 1, flexWrap: 'wrap' }}
              >
                {next && (
                  <Button
                    variant="contained"
                    startIcon={
                      advance.isPending ? (
                        <CircularProgress size={18} color="inherit" aria-hidden />
                      ) : (
                        next.icon
                      )
                    }
                    disabled={advance.isPending || arrive.isPending}
                    onClick={() => {
                      arrive.reset();
                      advance.mutate({ bookingId: booking.id, state: next.state });
                    }}
                  >
                    {next.label}
                  </Button>
                )}
                {arrivable && (
                  <Button
                    variant="outlined"
                    startIcon={
                      arrive.isPending ? (
                        <CircularProgress size={18} color="inherit" aria-hidden />
                      ) : (
                        <LocalShippingOutlined aria-hidden />
                      )
                    }
                    disabled={advance.isPending || arrive.isPending}
                    onClick={() => {
                      advance.reset();
                      arrive.mutate(booking.id);
                    }}
                  >
                    Mark arrived
                  </Button>
                )}
                {movable && (
                  <Button
                    variant="outlined"
                    startIcon={<EditCalendarOutlined aria-hidden />}
                    onClick={openMove}
                  >
                    Move
                  </Button>
                )}
                {cancellable && (
                  <Button
                    variant="outlined"
                    color="error"
                    startIcon={<EventBusyOutlined aria-hidden />}
                    onClick={() => {
                      resetActions();
                      setDialog('cancel');
                    }}
                  >
                    Cancel booking
                  </Button>
                )}
              </Box>
            )}
          </CardContent>
        </Card>

        <Card component="section" aria-labelledby={timesHeadingId}>
          <CardContent>
            <StartDetails
              startUtc={booking.startUtc}
              endUtc={booking.endUtc}
              segments={booking.segments}
              timeZone={timeZone}
              headingComponent="h2"
              headingId={timesHeadingId}
              title="Times and bays"
            />
          </CardContent>
        </Card>

        <Section title="Audit trail">
          <BookingAuditTrail booking={booking} />
          <Typography variant="body2" color="text.secondary" sx={{ mt: 1.5 }}>
            Times on the workshop’s clock ({timeZone.replace(/_/g, ' ')}).
          </Typography>
        </Section>
      </Box>

      <Box sx={{ display: 'grid', gap: 3, minWidth: 0 }}>
        <Section title="Customer">
          <DetailList>
            <DetailRow label="Name" value={booking.customer.name} />
            <DetailRow
              label="E-mail"
              value={
                <Link href={`mailto:${booking.customer.email}`} sx={{ overflowWrap: 'anywhere' }}>
                  {booking.customer.email}
                </Link>
              }
            />
            <DetailRow label="Rego" value={booking.rego ?? 'Not given'} />
          </DetailList>
        </Section>

        <Section title="Quote">
          <BookingQuoteRows booking={booking} quoteHref={quoteHref} />
          {newer && (
            <Alert
              severity={newer.state === 'sent' ? 'warning' : 'info'}
              role="note"
              sx={{ mt: 1.5 }}
            >
              {newerVersionText(booking, newer.number, newer.state)}{' '}
              <Link component={RouterLink} to={quoteHref}>
                See version {newer.number}
              </Link>
            </Alert>
          )}
          {revisable && (
            <Button
              component={RouterLink}
              to={reviseHref}
              variant="outlined"
              startIcon={<RateReviewOutlined aria-hidden />}
              sx={{ mt: 1.5 }}
            >
              Revise quote
            </Button>
          )}
        </Section>

        <Section title={`Fit report, version ${booking.quote.versionNumber}`}>
          <BookedFitReport booking={booking} load={quoteLoad} />
        </Section>

        {quoteLoad.quote && (
          <Section title="Photos">
            <QuotePhotos photos={quoteLoad.quote.photos} />
          </Section>
        )}

        <Section title="Payments">
          <PaymentsSummary booking={booking} />
          <PaymentLines booking={booking} />
        </Section>
      </Box>

      {movable && (
        <PickAnotherTimeDialog
          booking={booking}
          open={dialog === 'move'}
          onClose={close}
          note="The booking keeps its present time until you move it; every bay moves with it, or nothing changes."
          currentLabel="present time"
        />
      )}
      <CancelBookingDialog booking={booking} open={dialog === 'cancel'} onClose={close} forDesk />
    </Box>
  );
}
