import type { QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router';
import { warmSession } from '@/app/warm-session';
import { bookingQueryOptions } from '@/features/bookings/api/get-booking';
import { DepositNotCompleted } from '@/features/bookings/components/deposit-not-completed';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const user = await warmSession(queryClient);
    if (user?.role === 'customer' && params.bookingId) {
      void queryClient.prefetchQuery(bookingQueryOptions(params.bookingId));
    }
    return null;
  };

/** The provider's return address when the customer left its page without paying. */
export default function BookingDepositCancelledRoute() {
  const { bookingId = '' } = useParams();
  return <DepositNotCompleted key={bookingId} bookingId={bookingId} />;
}
