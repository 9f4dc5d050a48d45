import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { DepositCheckout } from '@/types/api';
import { bookingQueryKey } from './get-booking';
import { bookingsQueryKey } from './get-bookings';

/**
 * Opens the provider's payment page for a held booking's deposit (201): its address, when it
 * closes, and the booking with its hold kept until then. An open page of the same booking is
 * answered again rather than a second one made. 409 when the booking is no longer held, the
 * hold has lapsed or the deposit is paid; 502 when the provider cannot be reached.
 */
export function startDepositCheckout(bookingId: string): Promise<DepositCheckout> {
  return api.post<DepositCheckout>(
    `/api/bookings/${encodeURIComponent(bookingId)}/deposit-checkout`,
  );
}

export function useStartDepositCheckout() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: startDepositCheckout,
    onSuccess: async (checkout, bookingId) => {
      queryClient.setQueryData(bookingQueryKey(bookingId), checkout.booking);
      await queryClient.invalidateQueries({ queryKey: [...bookingsQueryKey, 'list'] });
    },
    // Refused: the booking has moved on (paid, expired, released): show it as it now stands.
    onError: (_error, bookingId) =>
      queryClient.invalidateQueries({ queryKey: bookingQueryKey(bookingId) }),
  });
}
