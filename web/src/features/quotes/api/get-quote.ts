import { queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Quote } from '@/types/api';
import { quotesQueryKey } from './get-quotes';

export function quoteQueryKey(id: string) {
  return [...quotesQueryKey, 'detail', id] as const;
}

/** One quote with every version (another customer's quote answers 404). */
export function getQuote(id: string): Promise<Quote> {
  return api.get<Quote>(`/api/quotes/${encodeURIComponent(id)}`);
}

export function quoteQueryOptions(id: string) {
  return queryOptions({ queryKey: quoteQueryKey(id), queryFn: () => getQuote(id) });
}
