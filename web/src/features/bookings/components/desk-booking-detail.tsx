import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import CircularProgress from '@mui/material/CircularProgress';
import Link from '@mui/material/Link';
import Typography from '@mui/material/Typography';
import CheckCircleOutline from '@mui/icons-material/CheckCircleOutline';
import EditCalendarOutlined from '@mui/icons-material/EditCalendarOutlined';
import EventAvailableOutlined from '@mui/icons-material/EventAvailableOutlined';
import EventBusyOutlined from '@mui/icons-material/EventBusyOutlined';
import HandymanOutlined from '@mui/icons-material/HandymanOutlined';
import { useId, useState, type ReactNode } from 'react';
import { isApiError } from '@/lib/api-client';
import type { AdvanceBookingRequest, Booking, BookingState } from '@/types/api';
import { useAdvanceBooking } from '../api/advance-booking';
import { bookingStateLabels, formatLocalDateTime, formatLocalTime } from '../utils/booking-text';
import { BookingStateChip } from './booking-state-chip';
import { CancelBookingDialog } from './cancel-booking-dialog';
import { BookingQuoteRows } from './booking-quote-rows';
import { DetailList, DetailRow } from './detail-list';
import { PaymentsSummary } from './payments-summary';
import { PickAnotherTimeDialog } from './pick-another-time-dialog';
import { StartDetails } from './start-details';

interface Props {
  booking: Booking;
  /** The desk's page of the booking's quote. */
  quoteHref: string;
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
const CANCELLABLE: readonly BookingState[] = ['held', 'requested', 'confirmed', 'in-progress'];

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
 * One booking as the front desk works it: the state and the step that comes next (confirm,
 * vehicle in, complete), move and cancel, then times and bays, the customer, the quote, the
 * payments and the customer's request to move, if any.
 */
export function DeskBookingDetail({ booking, quoteHref }: Props) {
  const [dialog, setDialog] = useState<'move' | 'cancel' | null>(null);
  const advance = useAdvanceBooking();
  const statusHeadingId = useId();
  const timesHeadingId = useId();
  const next = nextSteps[booking.state];
  const movable = MOVABLE.includes(booking.state);
  const cancellable = CANCELLABLE.includes(booking.state);
  const { timeZone } = booking;
  const close = () => setDialog(null);
  const advancedTo = advance.isSuccess ? advance.data.state : null;

  return (
    <Box
      sx={{
        display: 'grid',
        gap: 3,
        gridTemplateColumns: { xs: 'minmax(0, 1fr)', lg: 'minmax(0, 3fr) minmax(0, 2fr)' },
        alignItems: 'start',
      }}
    >
      <Box sx={{ display: 'grid', gap: 3, minWidth: 0 }}>
        <Card component="section" aria-labelledby={statusHeadingId}>
          <CardContent sx={{ display: 'grid', gap: 1.5 }}>
            <Box sx={{ display: 'flex', alignItems: 'center', gap: 1, flexWrap: 'wrap' }}>
              <Typography id={statusHeadingId} variant="h2" sx={{ fontSize: '1.2rem' }}>
                Status
              </Typography>
              <BookingStateChip state={booking.state} />
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
            {advance.isError && (
              <Alert severity="error">
                <AlertTitle>The booking was not changed</AlertTitle>
                {isApiError(advance.error) ? advance.error.message : 'Please try again.'}
              </Alert>
            )}
            {(next || movable || cancellable) && (
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
                    disabled={advance.isPending}
                    onClick={() => advance.mutate({ bookingId: booking.id, state: next.state })}
                  >
                    {next.label}
                  </Button>
                )}
                {movable && (
                  <Button
                    variant="outlined"
                    startIcon={<EditCalendarOutlined aria-hidden />}
                    onClick={() => {
                      advance.reset();
                      setDialog('move');
                    }}
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
                      advance.reset();
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

        {booking.moveRequest && (
          <Section title="The customer asks to move it">
            <Typography>“{booking.moveRequest.note}”</Typography>
            <Typography variant="body2" color="text.secondary" sx={{ mt: 1 }}>
              Asked on {formatLocalDateTime(booking.moveRequest.requestedAt, timeZone)}.
            </Typography>
          </Section>
        )}

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
          </DetailList>
        </Section>

        <Section title="Quote">
          <BookingQuoteRows booking={booking} quoteHref={quoteHref} />
        </Section>

        <Section title="Payments">
          <PaymentsSummary booking={booking} />
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
