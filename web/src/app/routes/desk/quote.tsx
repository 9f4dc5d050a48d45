import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import SendOutlined from '@mui/icons-material/SendOutlined';
import { useQuery } from '@tanstack/react-query';
import { Link as RouterLink, useParams } from 'react-router';
import { LoadingScreen } from '@/components/ui/loading-screen';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { quoteQueryOptions } from '@/features/quotes/api/get-quote';
import { useSendQuoteVersion } from '@/features/quotes/api/send-quote-version';
import { QuoteDetail } from '@/features/quotes/components/quote-detail';
import { isApiError } from '@/lib/api-client';

/** The front desk's view of a quote: read-only, with "Send to the customer" for a draft. */
export default function DeskQuoteRoute() {
  const { quoteId = '' } = useParams();
  const quote = useQuery(quoteQueryOptions(quoteId));
  const send = useSendQuoteVersion();
  if (quote.isPending) return <LoadingScreen label="Loading the quote" />;
  if (quote.isError) {
    return (
      <>
        <PageHeader title="Quote not found" />
        <Alert severity="error">
          {isApiError(quote.error) ? quote.error.message : 'The quote could not be loaded.'}
        </Alert>
      </>
    );
  }
  return (
    <>
      <PageHeader
        title={`Quote ${quote.data.reference}`}
        lead={
          <Link component={RouterLink} to={paths.desk.quotes.getHref()}>
            All quotes
          </Link>
        }
      />
      {send.isError && (
        <Alert severity="error" sx={{ mb: 2 }}>
          {isApiError(send.error) ? send.error.message : 'The quote could not be sent.'}
        </Alert>
      )}
      {send.isSuccess && (
        <Alert severity="success" role="status" sx={{ mb: 2 }}>
          The quote is open for {quote.data.customer.name} to accept.
        </Alert>
      )}
      <QuoteDetail
        quote={quote.data}
        viewer="staff"
        versionActions={(version, latest) =>
          latest && version.state === 'draft' ? (
            <Button
              variant="contained"
              startIcon={<SendOutlined aria-hidden />}
              disabled={send.isPending}
              onClick={() => send.mutate({ quoteId: quote.data.id, versionNumber: version.number })}
            >
              Send to the customer
            </Button>
          ) : null
        }
      />
    </>
  );
}
