import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import { useQuery } from '@tanstack/react-query';
import { Link as RouterLink, useParams } from 'react-router';
import { LoadingScreen } from '@/components/ui/loading-screen';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { quoteQueryOptions } from '@/features/quotes/api/get-quote';
import { QuoteDetail } from '@/features/quotes/components/quote-detail';
import { isApiError } from '@/lib/api-client';

export default function MyQuoteRoute() {
  const { quoteId = '' } = useParams();
  const quote = useQuery(quoteQueryOptions(quoteId));
  if (quote.isPending) return <LoadingScreen label="Loading the quote" />;
  if (quote.isError) {
    const missing = isApiError(quote.error) && quote.error.statusCode === 404;
    return (
      <>
        <PageHeader title={missing ? 'Quote not found' : 'The quote could not be loaded'} />
        <Alert
          severity="error"
          action={
            missing ? undefined : (
              <Button color="inherit" onClick={() => void quote.refetch()}>
                Try again
              </Button>
            )
          }
        >
          {missing
            ? 'There is no quote of yours at this address.'
            : isApiError(quote.error)
              ? quote.error.message
              : 'Please try again.'}
        </Alert>
        <Link
          component={RouterLink}
          to={paths.account.quotes.getHref()}
          sx={{ display: 'inline-block', mt: 2 }}
        >
          Back to my quotes
        </Link>
      </>
    );
  }
  return (
    <>
      <PageHeader
        title={`Quote ${quote.data.reference}`}
        lead={
          <Link component={RouterLink} to={paths.account.quotes.getHref()}>
            All my quotes
          </Link>
        }
      />
      <QuoteDetail quote={quote.data} viewer="customer" />
    </>
  );
}
