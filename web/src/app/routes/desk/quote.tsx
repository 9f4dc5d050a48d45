import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import EditNoteOutlined from '@mui/icons-material/EditNoteOutlined';
import SendOutlined from '@mui/icons-material/SendOutlined';
import { useQuery } from '@tanstack/react-query';
import { Link as RouterLink, useLocation, useParams } from 'react-router';
import { LoadingScreen } from '@/components/ui/loading-screen';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { quoteQueryOptions } from '@/features/quotes/api/get-quote';
import { useSendQuoteVersion } from '@/features/quotes/api/send-quote-version';
import { QuoteDetail } from '@/features/quotes/components/quote-detail';
import { isApiError } from '@/lib/api-client';

/** Set by the revision's review when it has just saved a new version of this quote. */
function revisedVersion(state: unknown): number | null {
  if (typeof state !== 'object' || state === null) return null;
  const value = (state as { revisedVersion?: unknown }).revisedVersion;
  return typeof value === 'number' && value > 0 ? value : null;
}

/**
 * The front desk's view of a quote: "Send to the customer" for a draft, and "Revise" on the latest
 * version, which opens the planner prefilled from it.
 */
export default function DeskQuoteRoute() {
  const { quoteId = '' } = useParams();
  const location = useLocation();
  const justRevised = revisedVersion(location.state);
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
      {justRevised !== null && (
        <Alert severity="success" role="status" sx={{ mb: 2 }}>
          Version {justRevised} is saved and e-mailed to {quote.data.customer.name}, with a link to
          compare it with the version before and accept it. The earlier version is replaced.
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
          latest ? (
            <>
              {version.state === 'draft' && (
                <Button
                  variant="contained"
                  startIcon={<SendOutlined aria-hidden />}
                  disabled={send.isPending}
                  onClick={() =>
                    send.mutate({ quoteId: quote.data.id, versionNumber: version.number })
                  }
                >
                  Send to the customer
                </Button>
              )}
              <Button
                component={RouterLink}
                to={paths.desk.revise.getHref(quote.data.id)}
                variant={version.state === 'draft' ? 'outlined' : 'contained'}
                startIcon={<EditNoteOutlined aria-hidden />}
              >
                Revise
              </Button>
            </>
          ) : null
        }
      />
    </>
  );
}
