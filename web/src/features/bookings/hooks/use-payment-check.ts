import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { bookingQueryOptions } from '../api/get-booking';
import { bookingsQueryKey } from '../api/get-bookings';
import { paymentCheckPhase, type PaymentCheckPhase } from '../utils/payment-text';

/** How often the booking is asked for while the provider's word is awaited. */
export const PAYMENT_POLL_INTERVAL_MS = 1_500;
/** How long one wait lasts before the page says it has not heard yet (Retry waits again). */
export const PAYMENT_WAIT_MS = 30_000;

/**
 * The booking after the customer comes back from the payment page. The address they came back
 * to proves nothing: the booking is read from the API, every 1.5 s while it is still held with
 * its payment open, for up to 30 s; `retry` waits once more.
 */
export function usePaymentCheck(bookingId: string) {
  const queryClient = useQueryClient();
  const [waitOver, setWaitOver] = useState(false);

  useEffect(() => {
    if (waitOver) return;
    const timer = window.setTimeout(() => setWaitOver(true), PAYMENT_WAIT_MS);
    return () => window.clearTimeout(timer);
  }, [waitOver]);

  const booking = useQuery({
    ...bookingQueryOptions(bookingId),
    // Whatever the cache holds from before the payment page, ask again.
    refetchOnMount: 'always',
    refetchInterval: (query) =>
      query.state.data && paymentCheckPhase(query.state.data, waitOver) === 'waiting'
        ? PAYMENT_POLL_INTERVAL_MS
        : false,
  });
  const phase: PaymentCheckPhase | null = booking.data
    ? paymentCheckPhase(booking.data, waitOver)
    : null;

  useEffect(() => {
    // The list shows the booking's new state too.
    if (phase === 'received') {
      void queryClient.invalidateQueries({ queryKey: [...bookingsQueryKey, 'list'] });
    }
  }, [phase, queryClient]);

  return {
    booking,
    phase,
    retry: () => {
      setWaitOver(false);
      void booking.refetch();
    },
  };
}
