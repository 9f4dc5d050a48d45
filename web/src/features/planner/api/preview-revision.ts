import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { QuotePreview, RevisionPreviewRequest } from '@/types/api';

/**
 * Front desk: the fit report and price a revision of the quote would have (the discount and the
 * labour overrides included); the API saves nothing.
 */
export function previewRevision(
  quoteId: string,
  body: RevisionPreviewRequest,
): Promise<QuotePreview> {
  // A signed-in staff route: sent with the CSRF token like any other POST (unlike the public
  // planner's preview).
  return api.post<QuotePreview>(
    `/api/quotes/${encodeURIComponent(quoteId)}/revisions/preview`,
    body,
  );
}

export function revisionPreviewQueryOptions(quoteId: string, body: RevisionPreviewRequest) {
  return queryOptions({
    queryKey: ['planner', 'revision-preview', quoteId, body] as const,
    queryFn: () => previewRevision(quoteId, body),
    placeholderData: keepPreviousData,
    // A refusal (a discount above the subtotal, a part that does not fit) is an answer, not a
    // network blip: it is shown at once.
    retry: false,
  });
}
