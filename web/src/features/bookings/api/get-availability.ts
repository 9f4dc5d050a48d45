import { queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Availability, AvailabilityQuery } from '@/types/api';

/** Every availability answer's key starts here: a booking made or moved refreshes them all. */
export const availabilityQueryKey = ['availability'] as const;

/**
 * What a quote version's job needs (its segments, earliest start) and the starts on offer per
 * workshop-local day. 409 when the version cannot be booked (expired, replaced, declined).
 */
export function getAvailability(query: AvailabilityQuery): Promise<Availability> {
  const search = new URLSearchParams({ quoteVersionId: query.quoteVersionId });
  if (query.from) search.set('from', query.from);
  if (query.days) search.set('days', String(query.days));
  return api.get<Availability>(`/api/availability?${search.toString()}`);
}

export function availabilityQueryOptions(query: AvailabilityQuery) {
  return queryOptions({
    queryKey: [...availabilityQueryKey, query] as const,
    queryFn: () => getAvailability(query),
    // Other customers book too: what is free goes stale quickly.
    staleTime: 15_000,
  });
}
