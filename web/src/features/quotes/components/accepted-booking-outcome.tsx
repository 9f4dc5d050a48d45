import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import CircularProgress from '@mui/material/CircularProgress';
import Typography from '@mui/material/Typography';
import PaymentOutlined from '@mui/icons-material/PaymentOutlined';
import type { ReactNode } from 'react';
import { Link as RouterLink } from 'react-router';
import { formatDateTime } from '@/lib/format';
import { formatCents } from '@/lib/money';
import type { Booking } from '@/types/api';
import { bookingOutcome, bookingTimesText } from '../utils/booking-outcome';

interface Props {
  /** The quote's active booking now (after accepting), if it has one. */
  booking: Booking | undefined;
  /** The same booking as it was just before accepting, when this page saw it. */
  before: Booking | null;
  versionNumber: number;
  /** Whether the bookings are still loading. */
  loading: boolean;
  bookingHref: (bookingId: string) => string;
  /** Where a quote without a booking books a time. */
  bookHref: string;
  /**
   * "Pay the difference" for a booking whose deposit went up (the bookings feature's checkout of
   * the top-up), shown when `depositTopUpCents > 0`.
   */
  payDifference?: (booking: Booking) => ReactNode;
}

/**
 * What accepting a revision did to the booking: kept at its time, re-planned for the new work, or
 * to be moved by the workshop; and, when the new deposit is higher, the difference to pay through
 * the same checkout as the deposit.
 */
export function AcceptedBookingOutcome({
  booking,
  before,
  versionNumber,
  loading,
  bookingHref,
  bookHref,
  payDifference,
}: Props) {
  if (loading) {
    return (
      <Box role="status" sx={{ display: 'flex', gap: 1.5, alignItems: 'center' }}>
        <CircularProgress size={20} aria-hidden />
        <Typography>Checking your booking…</Typography>
      </Box>
    );
  }
  if (!booking) {
    return (
      <Alert
        severity="info"
        action={
          <Button component={RouterLink} to={bookHref} color="inherit">
            Book a time
          </Button>
        }
      >
        This quote has no booking yet. Book a time in the workshop when it suits you.
      </Alert>
    );
  }
  const outcome = bookingOutcome(booking, before, versionNumber);
  const start = formatDateTime(booking.startUtc, booking.timeZone);
  const end = formatDateTime(booking.endUtc, booking.timeZone);
  const times = bookingTimesText(booking.startUtc, booking.endUtc, booking.timeZone);
  return (
    <Box sx={{ display: 'grid', gap: 1.5 }}>
      {outcome === 'needs-move' ? (
        <Alert severity="warning" role="status">
          <AlertTitle>The workshop will contact you to move booking {booking.reference}</AlertTitle>
          The new work does not fit the time you booked ({start}).
          {booking.needsMove?.reason ? ` ${booking.needsMove.reason}` : ''} Until then the time you
          booked stays reserved.
        </Alert>
      ) : outcome === 'moved' ? (
        <Alert severity="info" role="status">
          <AlertTitle>Booking {booking.reference} has a new time</AlertTitle>
          It is now {times}.
        </Alert>
      ) : outcome === 're-planned' ? (
        <Alert severity="success" role="status">
          <AlertTitle>Booking {booking.reference} is re-planned for the new work</AlertTitle>
          It still starts {start}; it now finishes {end}.
        </Alert>
      ) : outcome === 'updating' ? (
        <Alert severity="info" role="status">
          <AlertTitle>Booking {booking.reference} is being updated</AlertTitle>
          It is booked for {start}. The workshop updates it to version {versionNumber}.
        </Alert>
      ) : (
        <Alert severity="success" role="status">
          <AlertTitle>Booking {booking.reference} stays at its time</AlertTitle>
          {times}, now for version {versionNumber}.
        </Alert>
      )}

      {booking.depositTopUpCents > 0 && (
        <Alert severity="info" icon={<PaymentOutlined />}>
          <AlertTitle>The deposit went up by {formatCents(booking.depositTopUpCents)}</AlertTitle>
          <Box sx={{ display: 'grid', gap: 1.5 }}>
            <span>Pay the difference now through the same secure checkout as the deposit.</span>
            {payDifference?.(booking)}
          </Box>
        </Alert>
      )}
      <Box>
        <Button component={RouterLink} to={bookingHref(booking.id)} variant="text">
          Open booking {booking.reference}
        </Button>
      </Box>
    </Box>
  );
}
