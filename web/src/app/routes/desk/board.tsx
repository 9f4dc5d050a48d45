import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import TextField from '@mui/material/TextField';
import ChevronLeft from '@mui/icons-material/ChevronLeft';
import ChevronRight from '@mui/icons-material/ChevronRight';
import type { QueryClient } from '@tanstack/react-query';
import { useQuery } from '@tanstack/react-query';
import { useSearchParams } from 'react-router';
import { LoadingScreen } from '@/components/ui/loading-screen';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { warmSession } from '@/app/warm-session';
import { bookingsQueryOptions } from '@/features/bookings/api/get-bookings';
import { DayBoard } from '@/features/bookings/components/day-board';
import { WeekBoard } from '@/features/bookings/components/week-board';
import { formatShortLocalDate } from '@/features/bookings/utils/booking-text';
import { addDays, weekDates, workshopToday } from '@/features/bookings/utils/day-board';
import { workshopSetupQueryOptions } from '@/features/workshop-setup/api/get-workshop-setup';
import { isApiError } from '@/lib/api-client';

export const clientLoader = (queryClient: QueryClient) => async () => {
  const user = await warmSession(queryClient);
  if (user?.role === 'desk' || user?.role === 'manager') {
    void queryClient.prefetchQuery(workshopSetupQueryOptions());
    void queryClient.prefetchQuery(bookingsQueryOptions());
  }
  return null;
};

const DATE_PATTERN = /^\d{4}-\d{2}-\d{2}$/;

/** The day board: one day of bays and working time, or the week; the day is in the address. */
export default function DeskBoardRoute() {
  const [searchParams, setSearchParams] = useSearchParams();
  const setup = useQuery(workshopSetupQueryOptions());
  const bookings = useQuery(bookingsQueryOptions());
  if (setup.isPending || bookings.isPending) return <LoadingScreen label="Loading the day board" />;
  if (setup.isError || bookings.isError) {
    const error = setup.error ?? bookings.error;
    return (
      <>
        <PageHeader title="Day board" />
        <Alert
          severity="error"
          action={
            <Button
              color="inherit"
              onClick={() => {
                void setup.refetch();
                void bookings.refetch();
              }}
            >
              Try again
            </Button>
          }
        >
          {isApiError(error) ? error.message : 'The day board could not be loaded.'}
        </Alert>
      </>
    );
  }
  const today = workshopToday(setup.data.timeZone);
  const asked = searchParams.get('date');
  const date = asked && DATE_PATTERN.test(asked) ? asked : today;
  const view = searchParams.get('view') === 'week' ? 'week' : 'day';
  const step = view === 'week' ? 7 : 1;
  const go = (next: string, nextView: 'day' | 'week' = view) => {
    const search = new URLSearchParams();
    if (next !== today) search.set('date', next);
    if (nextView === 'week') search.set('view', 'week');
    setSearchParams(search);
  };
  const week = weekDates(date);
  const hrefFor = (booking: { id: string }) => paths.desk.booking.getHref(booking.id);

  return (
    <>
      <PageHeader
        title="Day board"
        lead={
          view === 'week'
            ? `Week of ${formatShortLocalDate(week[0])} to ${formatShortLocalDate(week[6])}.`
            : 'Bays across, working time down. Pick a booking to open it.'
        }
      />
      <Box
        role="toolbar"
        aria-label="Choose the day"
        sx={{ display: 'flex', flexWrap: 'wrap', alignItems: 'center', gap: 1.5, mb: 2.5 }}
      >
        <Box sx={{ display: 'flex', gap: 1 }}>
          <Button
            variant="outlined"
            startIcon={<ChevronLeft aria-hidden />}
            onClick={() => go(addDays(date, -step))}
          >
            {view === 'week' ? 'Previous week' : 'Previous day'}
          </Button>
          <Button variant="outlined" onClick={() => go(today)} disabled={date === today}>
            Today
          </Button>
          <Button
            variant="outlined"
            endIcon={<ChevronRight aria-hidden />}
            onClick={() => go(addDays(date, step))}
          >
            {view === 'week' ? 'Next week' : 'Next day'}
          </Button>
        </Box>
        <TextField
          type="date"
          label="Go to date"
          size="small"
          margin="none"
          value={date}
          onChange={(event) => {
            if (DATE_PATTERN.test(event.target.value)) go(event.target.value);
          }}
          slotProps={{ inputLabel: { shrink: true } }}
          sx={{ width: 180 }}
        />
        <Box role="group" aria-label="View" sx={{ display: 'flex', gap: 0.5 }}>
          {(['day', 'week'] as const).map((option) => (
            <Button
              key={option}
              variant={view === option ? 'contained' : 'outlined'}
              aria-pressed={view === option}
              onClick={() => go(date, option)}
            >
              {option === 'day' ? 'Day' : 'Week'}
            </Button>
          ))}
        </Box>
      </Box>
      {view === 'week' ? (
        <WeekBoard
          setup={setup.data}
          bookings={bookings.data.items}
          date={date}
          today={today}
          hrefFor={hrefFor}
          dayHref={(day) => paths.desk.board.getHref(day === today ? null : day)}
        />
      ) : (
        <DayBoard setup={setup.data} bookings={bookings.data.items} date={date} hrefFor={hrefFor} />
      )}
    </>
  );
}
