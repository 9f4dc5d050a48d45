import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Quote, ReviseQuoteRequest } from '@/types/api';

/** The quotes feature's cache keys start with this; a revision refreshes the quote and its lists. */
const QUOTES_QUERY_ROOT = ['quotes'] as const;

export interface ReviseQuoteInput {
  quoteId: string;
  body: ReviseQuoteRequest;
}

/**
 * Front desk: saves the revision as the quote's next version (sent to the customer, the previous
 * one superseded) and answers the whole quote.
 */
export function reviseQuote({ quoteId, body }: ReviseQuoteInput): Promise<Quote> {
  return api.post<Quote>(`/api/quotes/${encodeURIComponent(quoteId)}/revisions`, body);
}

export function useReviseQuote() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: reviseQuote,
    onSuccess: async (quote) => {
      queryClient.setQueryData([...QUOTES_QUERY_ROOT, 'detail', quote.id], quote);
      await queryClient.invalidateQueries({ queryKey: [...QUOTES_QUERY_ROOT, 'list'] });
      // A booking on the quote shows its latest version's state.
      await queryClient.invalidateQueries({ queryKey: ['bookings'] });
    },
  });
}
