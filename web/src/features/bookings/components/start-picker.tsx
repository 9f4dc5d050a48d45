import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import CircularProgress from '@mui/material/CircularProgress';
import Typography from '@mui/material/Typography';
import ChevronLeft from '@mui/icons-material/ChevronLeft';
import ChevronRight from '@mui/icons-material/ChevronRight';
import { AdapterLuxon } from '@mui/x-date-pickers/AdapterLuxon';
import { DateCalendar } from '@mui/x-date-pickers/DateCalendar';
import { LocalizationProvider } from '@mui/x-date-pickers/LocalizationProvider';
import { DateTime } from 'luxon';
import { useId, type ReactNode } from 'react';
import type { Availability, AvailabilityDay } from '@/types/api';
import type { StartChoice } from '../hooks/use-start-choice';
import { formatLocalDate, formatLocalTime, formatShortLocalDate } from '../utils/booking-text';

/** Why a day offers no start, in words. */
export function dayWithoutStartsReason(
  day: AvailabilityDay,
  availability: Availability,
  today: string | null,
): string {
  if (day.closedReason) return day.closedReason;
  if (day.date < availability.plan.earliestStartDate) {
    return availability.plan.longestLeadDays > 0
      ? 'Before the parts on order are in'
      : 'Too soon to start';
  }
  if (day.date === today) return 'No start times left today';
  return 'No bay free for the whole job';
}

function dayLabel(
  day: AvailabilityDay | undefined,
  availability: Availability,
  date: string,
  today: string | null,
) {
  const name = formatLocalDate(date);
  if (!day) return `${name}: not shown in these two weeks`;
  if (day.starts.length === 0) {
    return `${name}: ${dayWithoutStartsReason(day, availability, today)}`;
  }
  return `${name}: ${day.starts.length} start time${day.starts.length === 1 ? '' : 's'}`;
}

interface Props {
  choice: StartChoice;
  /** A start to mark as the booking's present one (moving a booking). */
  currentStartUtc?: string;
  /** How that start is marked ("your time" on the customer's screens). */
  currentLabel?: string;
  /** Heading level of the picker's parts. */
  headingComponent?: 'h2' | 'h3';
  /** Shown under the start times (beside the calendar on wide screens): the chosen time. */
  children?: ReactNode;
}

/**
 * The day and time picker: a calendar of two weeks (days without a start cannot be picked,
 * and say why), the reasons listed under it, then the day's start times as buttons.
 */
export function StartPicker({
  choice,
  currentStartUtc,
  currentLabel = 'your time',
  headingComponent = 'h2',
  children,
}: Props) {
  const { availability } = choice;
  const calendarHeadingId = useId();
  const timesHeadingId = useId();
  const closedHeadingId = useId();
  if (!availability) return null;
  const { timeZone } = availability;
  const days = new Map(availability.days.map((day) => [day.date, day]));
  const first = availability.days[0]?.date;
  const last = availability.days[availability.days.length - 1]?.date;
  const selectedDay = choice.date ? days.get(choice.date) : undefined;
  const withoutStarts = availability.days.filter((day) => day.starts.length === 0);
  // Days before the earliest start are one line; the others (closed, or no bay free) follow
  // in date order with their reasons.
  const beforeEarliest = withoutStarts.filter(
    (day) => !day.closedReason && day.date < availability.plan.earliestStartDate,
  );
  const laterWithout = withoutStarts.filter((day) => !beforeEarliest.includes(day));
  const reasonOf = (day: AvailabilityDay) =>
    dayWithoutStartsReason(day, availability, choice.today);
  const noneInWindow = withoutStarts.length === availability.days.length;
  const asDate = (iso: string) => DateTime.fromISO(iso, { zone: timeZone });
  const loading = choice.current.isFetching && choice.current.isPlaceholderData;

  return (
    <Box
      sx={{
        display: 'grid',
        gap: 3,
        gridTemplateColumns: { xs: 'minmax(0, 1fr)', md: 'minmax(0, 340px) minmax(0, 1fr)' },
        alignItems: 'start',
      }}
    >
      <Box component="section" aria-labelledby={calendarHeadingId} sx={{ minWidth: 0 }}>
        <Typography id={calendarHeadingId} variant="h3" component={headingComponent}>
          Pick a day
        </Typography>
        <Typography variant="body2" color="text.secondary" sx={{ mt: 0.5 }}>
          {first && last
            ? `${formatShortLocalDate(first)} to ${formatShortLocalDate(last)}. Days without a start time cannot be picked.`
            : null}
        </Typography>
        <LocalizationProvider dateAdapter={AdapterLuxon} adapterLocale="en-AU">
          <DateCalendar
            value={choice.date ? asDate(choice.date) : null}
            onChange={(value: DateTime | null) => {
              const iso = value?.toISODate();
              if (iso) choice.pickDate(iso);
            }}
            timezone={timeZone}
            minDate={first ? asDate(first) : undefined}
            maxDate={last ? asDate(last) : undefined}
            referenceDate={choice.date ? asDate(choice.date) : first ? asDate(first) : undefined}
            shouldDisableDate={(day: DateTime) => {
              const entry = days.get(day.toISODate() ?? '');
              return !entry || entry.starts.length === 0;
            }}
            views={['day']}
            disabled={loading}
            slotProps={{
              day: (ownerState) => {
                const iso = (ownerState.day as DateTime).toISODate() ?? '';
                return { 'aria-label': dayLabel(days.get(iso), availability, iso, choice.today) };
              },
            }}
            sx={{ mx: 0, width: '100%', maxWidth: 340 }}
          />
        </LocalizationProvider>
        <Box sx={{ display: 'flex', gap: 1, flexWrap: 'wrap', mb: 1.5 }}>
          <Button
            variant="outlined"
            size="small"
            startIcon={<ChevronLeft aria-hidden />}
            disabled={!choice.canGoEarlier || loading}
            onClick={choice.showEarlier}
          >
            Earlier two weeks
          </Button>
          <Button
            variant="outlined"
            size="small"
            endIcon={<ChevronRight aria-hidden />}
            disabled={loading}
            onClick={choice.showLater}
          >
            Later two weeks
          </Button>
          {loading && <CircularProgress size={20} aria-label="Loading the free times" />}
        </Box>
        {withoutStarts.length > 0 && (
          <Box component="section" aria-labelledby={closedHeadingId}>
            <Typography
              id={closedHeadingId}
              variant="subtitle2"
              component={headingComponent === 'h2' ? 'h3' : 'h4'}
            >
              Days without a start time
            </Typography>
            <Box component="ul" sx={{ m: 0, pl: 2.5 }}>
              {beforeEarliest.length > 0 && (
                <li>
                  <Typography variant="body2">
                    {beforeEarliest.length === 1
                      ? formatShortLocalDate(beforeEarliest[0].date)
                      : `${formatShortLocalDate(beforeEarliest[0].date)} to ${formatShortLocalDate(beforeEarliest[beforeEarliest.length - 1].date)}`}
                    : {reasonOf(beforeEarliest[0]).toLowerCase()}
                  </Typography>
                </li>
              )}
              {laterWithout.map((day) => (
                <li key={day.date}>
                  <Typography variant="body2">
                    {formatShortLocalDate(day.date)}:{' '}
                    {day.closedReason ?? reasonOf(day).toLowerCase()}
                  </Typography>
                </li>
              ))}
            </Box>
          </Box>
        )}
      </Box>

      <Box component="section" aria-labelledby={timesHeadingId} sx={{ minWidth: 0 }}>
        <Typography id={timesHeadingId} variant="h3" component={headingComponent}>
          {selectedDay ? `Start times on ${formatLocalDate(selectedDay.date)}` : 'Start times'}
        </Typography>
        {noneInWindow ? (
          <Alert severity="info" sx={{ mt: 1 }}>
            No start time is free in these two weeks. Try the later two weeks.
          </Alert>
        ) : selectedDay ? (
          <>
            <Typography variant="body2" color="text.secondary" sx={{ mt: 0.5, mb: 1.5 }}>
              When to bring the vehicle in, on the workshop&apos;s clock.
            </Typography>
            <Box
              role="group"
              aria-labelledby={timesHeadingId}
              sx={{
                display: 'grid',
                gap: 1,
                gridTemplateColumns: 'repeat(auto-fill, minmax(104px, 1fr))',
              }}
            >
              {selectedDay.starts.map((start) => {
                const pressed = choice.start?.startUtc === start.startUtc;
                const current = currentStartUtc === start.startUtc;
                return (
                  <Button
                    key={start.startUtc}
                    variant={pressed ? 'contained' : 'outlined'}
                    aria-pressed={pressed}
                    onClick={() => choice.pickStart(pressed ? null : start)}
                    sx={{ minHeight: 48, flexDirection: 'column', lineHeight: 1.2 }}
                  >
                    {formatLocalTime(start.startUtc, timeZone)}
                    {current && (
                      <Box component="span" sx={{ fontSize: '0.75rem', fontWeight: 400 }}>
                        {currentLabel}
                      </Box>
                    )}
                  </Button>
                );
              })}
            </Box>
          </>
        ) : (
          <Typography color="text.secondary" sx={{ mt: 1 }}>
            Pick a day to see its start times.
          </Typography>
        )}
        {children && <Box sx={{ display: 'grid', gap: 2, mt: 3 }}>{children}</Box>}
      </Box>
    </Box>
  );
}
