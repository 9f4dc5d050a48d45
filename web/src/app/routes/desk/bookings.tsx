import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import type { QueryClient } from '@tanstack/react-query';
import { useQuery } from '@tanstack/react-query';
import { Link as RouterLink } from 'react-router';
import { LoadingScreen } from '@/components/ui/loading-screen';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { warmSession } from '@/app/warm-session';
import { bookingsQueryOptions } from '@/features/bookings/api/get-bookings';
import { BookingRequestsGrid } from '@/features/bookings/components/booking-requests-grid';
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

const hrefFor = (booking: { id: string }) => paths.desk.booking.getHref(booking.id);

/** Booking requests and every other booking, as a table the desk filters and searches. */
export default function DeskBookingsRoute() {
  const setup = useQuery(workshopSetupQueryOptions());
  if (setup.isPending) return <LoadingScreen label="Loading the bookings" />;
  return (
    <>
      <PageHeader
        title="Requests and bookings"
        lead="Every booking, newest first. Pick a row to confirm, move or cancel it."
        actions={
          <Button component={RouterLink} to={paths.desk.board.getHref()} variant="outlined">
            Day board
          </Button>
        }
      />
      {setup.isError ? (
        <Alert severity="error">
          {isApiError(setup.error) ? setup.error.message : 'The workshop could not be loaded.'}
        </Alert>
      ) : (
        <BookingRequestsGrid label="Bookings" timeZone={setup.data.timeZone} hrefFor={hrefFor} />
      )}
    </>
  );
}
