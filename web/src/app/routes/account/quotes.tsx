import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Skeleton from '@mui/material/Skeleton';
import Typography from '@mui/material/Typography';
import type { QueryClient } from '@tanstack/react-query';
import { useQuery } from '@tanstack/react-query';
import { Link as RouterLink } from 'react-router';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { warmSession } from '@/app/warm-session';
import { quotesQueryOptions } from '@/features/quotes/api/get-quotes';
import { QuoteList } from '@/features/quotes/components/quote-list';
import { isApiError } from '@/lib/api-client';
import type { QuoteSummary } from '@/types/api';

/** A revision the workshop sent that waits for the customer's answer. */
function awaitsAnswerToRevision(quote: QuoteSummary): boolean {
  return quote.latestVersion.state === 'sent' && quote.latestVersion.number > 1;
}

export const clientLoader = (queryClient: QueryClient) => async () => {
  const user = await warmSession(queryClient);
  if (user?.role === 'customer') void queryClient.prefetchQuery(quotesQueryOptions());
  return null;
};

export default function MyQuotesRoute() {
  const quotes = useQuery(quotesQueryOptions());
  const items = quotes.data?.items ?? [];
  return (
    <>
      <PageHeader
        title="My quotes"
        lead="Every quote you have saved, newest first. Open one to see its versions and the PDF."
        actions={
          <Button component={RouterLink} to={paths.plan.getHref()} variant="contained">
            Plan a new build
          </Button>
        }
      />
      {quotes.isPending ? (
        <Box sx={{ display: 'grid', gap: 1.5 }} role="status" aria-label="Loading your quotes">
          <Skeleton variant="rounded" height={110} />
          <Skeleton variant="rounded" height={110} />
        </Box>
      ) : quotes.isError ? (
        <Alert
          severity="error"
          action={
            <Button color="inherit" onClick={() => void quotes.refetch()}>
              Try again
            </Button>
          }
        >
          {isApiError(quotes.error) ? quotes.error.message : 'Your quotes could not be loaded.'}
        </Alert>
      ) : items.length === 0 ? (
        <Typography color="text.secondary">
          No quotes yet. Plan a build and save it to see it here.
        </Typography>
      ) : (
        <QuoteList
          quotes={items}
          hrefFor={(quote) =>
            awaitsAnswerToRevision(quote)
              ? paths.account.quoteCompare.getHref(quote.id, quote.latestVersion.number)
              : paths.account.quote.getHref(quote.id)
          }
          noteFor={(quote) =>
            awaitsAnswerToRevision(quote)
              ? `Revised to version ${quote.latestVersion.number}: compare and answer`
              : null
          }
          aria-label="My quotes"
        />
      )}
    </>
  );
}
