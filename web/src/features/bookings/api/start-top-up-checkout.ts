import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { DepositCheckout } from '@/types/api';
import { bookingQueryKey } from './get-booking';
import { bookingsQueryKey } from './get-bookings';

/**
 * Opens the provider's payment page for the difference when the booking's revised quote asks
 * a higher deposit than was paid (201, a payment of kind `top-up`); the provider sends the
 * customer back to the booking page. 409 when nothing is due any more.
 */
export function startTopUpCheckout(bookingId: string): Promise<DepositCheckout> {
  return api.post<DepositCheckout>(
    `/api/bookings/${encodeURIComponent(bookingId)}/top-up-checkout`,
  );
}

export function useStartTopUpCheckout() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: startTopUpCheckout,
    // The page leaves for the provider next: the booking is updated in place and the lists are
    // marked stale without a refetch now (one would re-render the page on the way out).
    onSuccess: (checkout, bookingId) => {
      queryClient.setQueryData(bookingQueryKey(bookingId), checkout.booking);
      void queryClient.invalidateQueries({
        queryKey: [...bookingsQueryKey, 'list'],
        refetchType: 'none',
      });
    },
    // Refused (nothing due any more, or paid meanwhile): show the booking as it now stands.
    onError: (_error, bookingId) =>
      queryClient.invalidateQueries({ queryKey: bookingQueryKey(bookingId) }),
  });
}
