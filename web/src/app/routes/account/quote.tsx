import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import EventAvailableOutlined from '@mui/icons-material/EventAvailableOutlined';
import { useQuery } from '@tanstack/react-query';
import { Link as RouterLink, useLocation, useParams } from 'react-router';
import { LoadingScreen } from '@/components/ui/loading-screen';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { quoteQueryOptions } from '@/features/quotes/api/get-quote';
import { MyQuoteLoadError } from '@/features/quotes/components/my-quote-load-error';
import { QuoteDetail } from '@/features/quotes/components/quote-detail';

/** Set by the planner's review step when it has just saved this quote. */
function savedFromPlanner(state: unknown): boolean {
  return (
    typeof state === 'object' &&
    state !== null &&
    (state as { savedFromPlanner?: unknown }).savedFromPlanner === true
  );
}

export default function MyQuoteRoute() {
  const { quoteId = '' } = useParams();
  const location = useLocation();
  const quote = useQuery(quoteQueryOptions(quoteId));
  if (quote.isPending) return <LoadingScreen label="Loading the quote" />;
  if (quote.isError) {
    return <MyQuoteLoadError error={quote.error} onRetry={() => void quote.refetch()} />;
  }
  const latest = [...quote.data.versions].sort((a, b) => b.number - a.number)[0];
  const latestBookable = latest?.bookable ?? false;
  // A revision from the workshop waiting for an answer: compared with the version before it.
  const openRevision = latest && latest.number > 1 && latest.state === 'sent' ? latest : null;
  const bookHref = paths.plan.book.getHref(quote.data.id);
  const justSaved = savedFromPlanner(location.state);
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
      {justSaved && (
        <Alert
          severity="success"
          sx={{ mb: 3 }}
          action={
            latestBookable ? (
              <Button color="inherit" component={RouterLink} to={bookHref}>
                Book a time
              </Button>
            ) : undefined
          }
        >
          <AlertTitle>Quote {quote.data.reference} is saved</AlertTitle>
          {latestBookable
            ? 'Book a time in the workshop now, or come back to it any time before the prices run out.'
            : 'You will find it under My quotes.'}
        </Alert>
      )}
      {openRevision && (
        <Alert
          severity="info"
          sx={{ mb: 3 }}
          action={
            <Button
              color="inherit"
              component={RouterLink}
              to={paths.account.quoteCompare.getHref(quote.data.id, openRevision.number)}
            >
              Compare versions
            </Button>
          }
        >
          <AlertTitle>The workshop revised this quote</AlertTitle>
          Version {openRevision.number} replaces version {openRevision.number - 1}. See what changed
          side by side, then accept or decline it.
        </Alert>
      )}
      <QuoteDetail
        quote={quote.data}
        viewer="customer"
        versionActions={(version, latest) =>
          latest && version.bookable ? (
            <Button
              component={RouterLink}
              to={bookHref}
              variant="contained"
              color="secondary"
              startIcon={<EventAvailableOutlined aria-hidden />}
            >
              Book a time
            </Button>
          ) : null
        }
      />
    </>
  );
}
