import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Quote } from '@/types/api';
import { quotesQueryKey } from './get-quotes';

export interface SendQuoteVersionInput {
  quoteId: string;
  versionNumber: number;
}

/** Front desk: a draft version goes to the customer (draft → sent). */
export function sendQuoteVersion({
  quoteId,
  versionNumber,
}: SendQuoteVersionInput): Promise<Quote> {
  return api.post<Quote>(
    `/api/quotes/${encodeURIComponent(quoteId)}/versions/${versionNumber}/send`,
  );
}

export function useSendQuoteVersion() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: sendQuoteVersion,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: quotesQueryKey }),
  });
}
