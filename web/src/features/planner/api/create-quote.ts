import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { CreateQuoteRequest, Quote } from '@/types/api';

/** The quotes feature's cache keys start with this; a new quote refreshes its lists. */
const QUOTES_QUERY_ROOT = ['quotes'] as const;

/** Saves the package as a quote (version 1): the customer's own, or a walk-in customer's. */
export function createQuote(body: CreateQuoteRequest): Promise<Quote> {
  return api.post<Quote>('/api/quotes', body);
}

export function useCreateQuote() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createQuote,
    onSuccess: async (quote) => {
      queryClient.setQueryData([...QUOTES_QUERY_ROOT, 'detail', quote.id], quote);
      await queryClient.invalidateQueries({ queryKey: [...QUOTES_QUERY_ROOT, 'list'] });
      await queryClient.invalidateQueries({ queryKey: ['uploads'] });
    },
  });
}
