import { queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { QuoteListResponse, QuoteQuery } from '@/types/api';

export const quotesQueryKey = ['quotes'] as const;

/** A customer's own quotes; for the front desk every quote, searchable. Newest first. */
export function getQuotes(query: QuoteQuery = {}): Promise<QuoteListResponse> {
  const search = new URLSearchParams();
  if (query.customerId) search.set('customerId', query.customerId);
  if (query.q?.trim()) search.set('q', query.q.trim());
  const text = search.toString();
  return api.get<QuoteListResponse>(text ? `/api/quotes?${text}` : '/api/quotes');
}

export function quotesQueryOptions(query: QuoteQuery = {}) {
  return queryOptions({
    queryKey: [...quotesQueryKey, 'list', query] as const,
    queryFn: () => getQuotes(query),
  });
}
