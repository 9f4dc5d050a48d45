import type { QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router';
import { warmSession } from '@/app/warm-session';
import { bookingQueryOptions } from '@/features/bookings/api/get-booking';
import { DepositPaidCheck } from '@/features/bookings/components/deposit-paid-check';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const user = await warmSession(queryClient);
    if (user?.role === 'customer' && params.bookingId) {
      void queryClient.prefetchQuery(bookingQueryOptions(params.bookingId));
    }
    return null;
  };

/** The provider's return address after paying (its session id in the query is not trusted). */
export default function BookingPaidRoute() {
  const { bookingId = '' } = useParams();
  // A fresh check per booking: the wait starts again when the address changes.
  return <DepositPaidCheck key={bookingId} bookingId={bookingId} />;
}
