import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import type { QueryClient } from '@tanstack/react-query';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { Link as RouterLink, useParams, type LoaderFunctionArgs } from 'react-router';
import { LoadingScreen } from '@/components/ui/loading-screen';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { warmSession } from '@/app/warm-session';
import { bookingQueryOptions } from '@/features/bookings/api/get-booking';
import { bookingsQueryKey } from '@/features/bookings/api/get-bookings';
import { BookingDetail } from '@/features/bookings/components/booking-detail';
import { isApiError } from '@/lib/api-client';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const user = await warmSession(queryClient);
    if (user?.role === 'customer' && params.bookingId) {
      void queryClient.prefetchQuery(bookingQueryOptions(params.bookingId));
    }
    return null;
  };

export default function MyBookingRoute() {
  const { bookingId = '' } = useParams();
  const queryClient = useQueryClient();
  const booking = useQuery(bookingQueryOptions(bookingId));
  if (booking.isPending) return <LoadingScreen label="Loading the booking" />;
  if (booking.isError) {
    const missing = isApiError(booking.error) && booking.error.statusCode === 404;
    return (
      <>
        <PageHeader title={missing ? 'Booking not found' : 'The booking could not be loaded'} />
        <Alert
          severity="error"
          action={
            missing ? undefined : (
              <Button color="inherit" onClick={() => void booking.refetch()}>
                Try again
              </Button>
            )
          }
        >
          {missing
            ? 'There is no booking of yours at this address.'
            : isApiError(booking.error)
              ? booking.error.message
              : 'Please try again.'}
        </Alert>
        <Link
          component={RouterLink}
          to={paths.account.bookings.getHref()}
          sx={{ display: 'inline-block', mt: 2 }}
        >
          Back to my bookings
        </Link>
      </>
    );
  }
  return (
    <>
      <PageHeader
        title={`Booking ${booking.data.reference}`}
        lead={
          <Link component={RouterLink} to={paths.account.bookings.getHref()}>
            All my bookings
          </Link>
        }
      />
      <BookingDetail
        booking={booking.data}
        quoteHref={paths.account.quote.getHref(booking.data.quote.id)}
        onHoldExpired={() => void queryClient.invalidateQueries({ queryKey: bookingsQueryKey })}
      />
    </>
  );
}
