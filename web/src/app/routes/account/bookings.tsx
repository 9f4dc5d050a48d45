import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Skeleton from '@mui/material/Skeleton';
import Typography from '@mui/material/Typography';
import type { QueryClient } from '@tanstack/react-query';
import { useQuery } from '@tanstack/react-query';
import { Link as RouterLink } from 'react-router';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { warmSession } from '@/app/warm-session';
import { bookingsQueryOptions } from '@/features/bookings/api/get-bookings';
import { BookingList } from '@/features/bookings/components/booking-list';
import { isApiError } from '@/lib/api-client';

export const clientLoader = (queryClient: QueryClient) => async () => {
  const user = await warmSession(queryClient);
  if (user?.role === 'customer') void queryClient.prefetchQuery(bookingsQueryOptions());
  return null;
};

export default function MyBookingsRoute() {
  const bookings = useQuery(bookingsQueryOptions());
  const items = bookings.data?.items ?? [];
  return (
    <>
      <PageHeader
        title="My bookings"
        lead="Your times in the workshop, newest first, on the workshop's clock."
        actions={
          <Button component={RouterLink} to={paths.account.quotes.getHref()} variant="outlined">
            My quotes
          </Button>
        }
      />
      {bookings.isPending ? (
        <Box sx={{ display: 'grid', gap: 1.5 }} role="status" aria-label="Loading your bookings">
          <Skeleton variant="rounded" height={120} />
          <Skeleton variant="rounded" height={120} />
        </Box>
      ) : bookings.isError ? (
        <Alert
          severity="error"
          action={
            <Button color="inherit" onClick={() => void bookings.refetch()}>
              Try again
            </Button>
          }
        >
          {isApiError(bookings.error)
            ? bookings.error.message
            : 'Your bookings could not be loaded.'}
        </Alert>
      ) : items.length === 0 ? (
        <Typography color="text.secondary">
          No bookings yet. Open one of your quotes and choose “Book a time”.
        </Typography>
      ) : (
        <BookingList
          bookings={items}
          hrefFor={(booking) => paths.account.booking.getHref(booking.id)}
          aria-label="My bookings"
        />
      )}
    </>
  );
}
