import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import type { QueryClient } from '@tanstack/react-query';
import { useQuery } from '@tanstack/react-query';
import { Link as RouterLink, useParams, type LoaderFunctionArgs } from 'react-router';
import { LoadingScreen } from '@/components/ui/loading-screen';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { warmSession } from '@/app/warm-session';
import { bookingQueryOptions } from '@/features/bookings/api/get-booking';
import { DeskBookingDetail } from '@/features/bookings/components/desk-booking-detail';
import { localDateOf } from '@/features/bookings/utils/booking-text';
import { quoteQueryOptions } from '@/features/quotes/api/get-quote';
import { isApiError } from '@/lib/api-client';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const user = await warmSession(queryClient);
    if ((user?.role === 'desk' || user?.role === 'manager') && params.bookingId) {
      void queryClient.prefetchQuery(bookingQueryOptions(params.bookingId));
    }
    return null;
  };

function BackLinks({ date }: { date?: string }) {
  return (
    <Box component="span" sx={{ display: 'inline-flex', gap: 2, flexWrap: 'wrap' }}>
      <Link component={RouterLink} to={paths.desk.bookings.getHref()}>
        All bookings
      </Link>
      <Link component={RouterLink} to={paths.desk.board.getHref(date)}>
        {date ? 'This day on the board' : 'Day board'}
      </Link>
    </Box>
  );
}

/**
 * One booking for the front desk: its next step, move and cancel, and everything on it; the
 * quote (fit report, photos) is read from the quotes feature and shares its cache.
 */
export default function DeskBookingRoute() {
  const { bookingId = '' } = useParams();
  const booking = useQuery(bookingQueryOptions(bookingId));
  // The booking's quote (fit report, photos): read once the booking names it.
  const quoteId = booking.data?.quote.id ?? '';
  const quote = useQuery({ ...quoteQueryOptions(quoteId), enabled: quoteId !== '' });
  if (booking.isPending) return <LoadingScreen label="Loading the booking" />;
  if (booking.isError) {
    const missing = isApiError(booking.error) && booking.error.statusCode === 404;
    return (
      <>
        <PageHeader
          title={missing ? 'Booking not found' : 'The booking could not be loaded'}
          lead={<BackLinks />}
        />
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
            ? 'There is no booking at this address.'
            : isApiError(booking.error)
              ? booking.error.message
              : 'Please try again.'}
        </Alert>
      </>
    );
  }
  const { data } = booking;
  return (
    <>
      <PageHeader
        title={`Booking ${data.reference}`}
        lead={<BackLinks date={localDateOf(data.startUtc, data.timeZone)} />}
      />
      <DeskBookingDetail
        booking={data}
        quoteHref={paths.desk.quote.getHref(data.quote.id)}
        reviseHref={paths.desk.revise.getHref(data.quote.id)}
        quoteLoad={{
          quote: quote.data,
          loading: quote.isPending,
          failed: quote.isError,
          retry: () => void quote.refetch(),
        }}
      />
    </>
  );
}
