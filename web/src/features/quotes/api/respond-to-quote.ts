import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Quote } from '@/types/api';
import { quoteQueryKey } from './get-quote';
import { quotesQueryKey } from './get-quotes';

/** What a customer can do with the latest version they were sent. */
export type QuoteResponseAction = 'accept' | 'decline';

export interface RespondToQuoteInput {
  quoteId: string;
  versionNumber: number;
  action: QuoteResponseAction;
}

/** Accepts or declines one version; an expired, replaced or answered one is refused (409). */
export function respondToQuote({
  quoteId,
  versionNumber,
  action,
}: RespondToQuoteInput): Promise<Quote> {
  return api.post<Quote>(
    `/api/quotes/${encodeURIComponent(quoteId)}/versions/${versionNumber}/${action}`,
  );
}

export function useRespondToQuote() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: respondToQuote,
    onSuccess: async (quote, { quoteId }) => {
      if (quote && typeof quote === 'object' && 'versions' in quote) {
        queryClient.setQueryData(quoteQueryKey(quoteId), quote);
      }
      await queryClient.invalidateQueries({ queryKey: quotesQueryKey });
    },
    // A refusal (expired, replaced, already answered) means the page is out of date: refresh it.
    onError: () => queryClient.invalidateQueries({ queryKey: quotesQueryKey }),
  });
}
