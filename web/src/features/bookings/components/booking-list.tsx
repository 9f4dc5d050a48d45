import Box from '@mui/material/Box';
import Card from '@mui/material/Card';
import CardActionArea from '@mui/material/CardActionArea';
import CardContent from '@mui/material/CardContent';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router';
import { formatCents } from '@/lib/money';
import type { Booking } from '@/types/api';
import { confirmedAt, customerBookingNotes } from '../utils/booking-history';
import { formatLocalDateTime } from '../utils/booking-text';
import { BookingStateChip } from './booking-state-chip';

interface Props {
  bookings: readonly Booking[];
  hrefFor: (booking: Booking) => string;
  'aria-label': string;
}

const noteColours = { action: 'warning.dark', info: 'info.dark', done: 'text.secondary' } as const;

/**
 * Bookings as cards, newest first: reference, state, start on the workshop's clock (with the
 * confirmation), vehicle, and what changed or waits for the customer (a revised quote to
 * answer, a deposit difference, the request to move, the last move).
 */
export function BookingList({ bookings, hrefFor, ...aria }: Props) {
  return (
    <Box
      component="ul"
      aria-label={aria['aria-label']}
      sx={{
        listStyle: 'none',
        p: 0,
        m: 0,
        display: 'grid',
        gap: 1.5,
        gridTemplateColumns: { xs: '1fr', md: '1fr 1fr' },
      }}
    >
      {bookings.map((booking) => (
        <li key={booking.id}>
          <Card sx={{ height: '100%' }}>
            <CardActionArea component={RouterLink} to={hrefFor(booking)} sx={{ height: '100%' }}>
              <CardContent>
                <Box
                  sx={{
                    display: 'flex',
                    justifyContent: 'space-between',
                    alignItems: 'center',
                    gap: 1,
                  }}
                >
                  <Typography variant="h2" sx={{ fontSize: '1.15rem' }}>
                    Booking {booking.reference}
                  </Typography>
                  <BookingStateChip state={booking.state} />
                </Box>
                <Typography sx={{ mt: 0.5, fontWeight: 500 }}>
                  {formatLocalDateTime(booking.startUtc, booking.timeZone)}
                </Typography>
                {booking.state === 'confirmed' && confirmedAt(booking) && (
                  <Typography variant="body2" color="success.main">
                    Confirmed by the workshop
                  </Typography>
                )}
                <Typography>{booking.quote.vehicleName}</Typography>
                <Typography variant="body2" color="text.secondary" sx={{ mt: 1 }}>
                  Quote {booking.quote.reference}
                  {booking.quote.versionNumber > 1
                    ? `, version ${booking.quote.versionNumber}`
                    : ''}
                </Typography>
                {customerBookingNotes(booking, formatCents).map((note) => (
                  <Typography
                    key={note.text}
                    variant="body2"
                    sx={{
                      mt: 0.5,
                      color: noteColours[note.tone],
                      fontWeight: note.tone === 'action' ? 500 : 400,
                    }}
                  >
                    {note.text}
                  </Typography>
                ))}
              </CardContent>
            </CardActionArea>
          </Card>
        </li>
      ))}
    </Box>
  );
}
