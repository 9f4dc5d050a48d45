import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { QuotePackageRequest, QuotePreview } from '@/types/api';

/** The fit report and price of the package as it stands; the API saves nothing. */
export function previewQuote(body: QuotePackageRequest): Promise<QuotePreview> {
  return api.compute<QuotePreview>('/api/quotes/preview', body);
}

export function quotePreviewQueryOptions(body: QuotePackageRequest) {
  return queryOptions({
    queryKey: ['planner', 'preview', body] as const,
    queryFn: () => previewQuote(body),
    placeholderData: keepPreviousData,
  });
}
