import Box from '@mui/material/Box';
import Link from '@mui/material/Link';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router';
import type { Booking, WorkshopSetup } from '@/types/api';
import { bookingStateLabels, formatLocalTime, formatShortLocalDate } from '../utils/booking-text';
import { bookingsOnDay, dayStatus, weekDates } from '../utils/day-board';

interface Props {
  setup: WorkshopSetup;
  bookings: readonly Booking[];
  /** Any day of the week shown. */
  date: string;
  today: string;
  hrefFor: (booking: Booking) => string;
  /** Opens one day on the day board. */
  dayHref: (date: string) => string;
}

/**
 * The week, Monday first: a column per day (on a phone, one day under another) listing its
 * bookings by start time with their bays; a closed day says why.
 */
export function WeekBoard({ setup, bookings, date, today, hrefFor, dayHref }: Props) {
  const { timeZone } = setup;
  return (
    <Box
      component="ol"
      aria-label="The week’s bookings by day"
      sx={{
        listStyle: 'none',
        m: 0,
        p: 0,
        display: 'grid',
        // A phone lists the days one under another; wider screens set the week side by side.
        gridTemplateColumns: { xs: 'minmax(0, 1fr)', md: 'repeat(7, minmax(120px, 1fr))' },
        gap: 1,
        overflowX: 'auto',
      }}
    >
      {weekDates(date).map((day) => {
        const status = dayStatus(day, setup);
        const entries = bookingsOnDay(bookings, day, timeZone);
        const isToday = day === today;
        return (
          <Box
            component="li"
            key={day}
            aria-label={`${formatShortLocalDate(day)}${isToday ? ' (today)' : ''}`}
            sx={{
              minWidth: 0,
              border: isToday ? 2 : 1,
              borderColor: isToday ? 'primary.main' : 'divider',
              borderRadius: 1,
              bgcolor: status.open ? 'background.paper' : 'action.hover',
              p: 1,
              display: 'grid',
              alignContent: 'start',
              gap: 1,
            }}
          >
            <Link
              component={RouterLink}
              to={dayHref(day)}
              sx={{ fontWeight: 700 }}
              aria-label={`Open ${formatShortLocalDate(day)} on the day board`}
            >
              {formatShortLocalDate(day)}
            </Link>
            {!status.open && (
              <Typography variant="body2" color="text.secondary">
                {status.reason}
              </Typography>
            )}
            {entries.length === 0 ? (
              status.open && (
                <Typography variant="body2" color="text.secondary">
                  No bookings
                </Typography>
              )
            ) : (
              <Box component="ul" sx={{ listStyle: 'none', m: 0, p: 0, display: 'grid', gap: 1 }}>
                {entries.map(({ booking, firstStartUtc, startsThatDay, bayNames }) => {
                  const held = booking.state === 'held';
                  return (
                    <li key={booking.id}>
                      <Box
                        component={RouterLink}
                        to={hrefFor(booking)}
                        sx={(theme) => ({
                          display: 'block',
                          p: 0.75,
                          borderRadius: 1,
                          border: '1px solid',
                          borderStyle: held ? 'dashed' : 'solid',
                          borderColor: held ? 'warning.dark' : 'divider',
                          textDecoration: 'none',
                          color: 'text.primary',
                          fontSize: '0.8125rem',
                          lineHeight: 1.35,
                          '&:hover': { bgcolor: 'action.hover' },
                          '&:focus-visible': {
                            outline: `3px solid ${theme.palette.secondary.main}`,
                            outlineOffset: 1,
                          },
                        })}
                      >
                        <Box component="span" sx={{ display: 'block', fontWeight: 700 }}>
                          {startsThatDay ? formatLocalTime(firstStartUtc, timeZone) : 'From before'}{' '}
                          · {booking.customer.name}
                        </Box>
                        <Box component="span" sx={{ display: 'block' }}>
                          {booking.quote.vehicleName}
                        </Box>
                        {booking.quote.packageSummary && (
                          <Box component="span" sx={{ display: 'block', color: 'text.secondary' }}>
                            {booking.quote.packageSummary}
                          </Box>
                        )}
                        <Box component="span" sx={{ display: 'block', color: 'text.secondary' }}>
                          {bayNames.join(', ')} · {booking.quote.reference} ·{' '}
                          {bookingStateLabels[booking.state]}
                          {held && booking.holdExpiresAt
                            ? ` until ${formatLocalTime(booking.holdExpiresAt, timeZone)}`
                            : ''}
                        </Box>
                      </Box>
                    </li>
                  );
                })}
              </Box>
            )}
          </Box>
        );
      })}
    </Box>
  );
}
