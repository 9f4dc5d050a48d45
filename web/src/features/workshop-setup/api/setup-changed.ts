import type { QueryClient } from '@tanstack/react-query';
import type { WorkshopSetup } from '@/types/api';
import { workshopSetupQueryKey } from './get-workshop-setup';

/** The booking feature's free times start with this key: they follow the calendar. */
const AVAILABILITY_QUERY_ROOT = ['availability'] as const;
/** The workshop card (name, address, time zone) every area reads its dates with. */
const WORKSHOP_CARD_QUERY_KEY = ['workshop'] as const;

/**
 * After any change: the answer is the whole set-up, so it replaces the cached one; the free
 * times are asked for again, and the workshop card too when the time zone may have moved.
 */
export async function setupChanged(
  queryClient: QueryClient,
  setup: WorkshopSetup,
  { timeZoneMayChange = false } = {},
): Promise<void> {
  queryClient.setQueryData(workshopSetupQueryKey, setup);
  await Promise.all([
    queryClient.invalidateQueries({ queryKey: AVAILABILITY_QUERY_ROOT }),
    timeZoneMayChange
      ? queryClient.invalidateQueries({ queryKey: WORKSHOP_CARD_QUERY_KEY, exact: true })
      : Promise.resolve(),
  ]);
}
