import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Navigate, Link as RouterLink, useParams } from 'react-router';
import { LoadingScreen } from '@/components/ui/loading-screen';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { bookingsQueryOptions } from '@/features/bookings/api/get-bookings';
import { PayTopUp } from '@/features/bookings/components/pay-top-up';
import { quoteQueryOptions } from '@/features/quotes/api/get-quote';
import { MyQuoteLoadError } from '@/features/quotes/components/my-quote-load-error';
import { quotesQueryOptions } from '@/features/quotes/api/get-quotes';
import { workshopQueryOptions } from '@/features/quotes/api/get-workshop';
import { AcceptedBookingOutcome } from '@/features/quotes/components/accepted-booking-outcome';
import { CompareAnswer } from '@/features/quotes/components/compare-answer';
import { VersionCompare } from '@/features/quotes/components/version-compare';
import { activeBookingOf } from '@/features/quotes/utils/booking-outcome';
import { previousVersion } from '@/features/quotes/utils/version-diff';
import type { Booking } from '@/types/api';

/**
 * The customer's comparison of a revised version with the one before it: what changed, both in
 * full, the cautions, Accept or Decline, and then what happened to the booking (and the
 * difference to pay when the deposit went up).
 */
/** "Q-000014": the e-mail's link names the quote by the reference the customer knows. */
const QUOTE_REFERENCE = /^Q-\d{6,}$/i;

export default function QuoteCompareRoute() {
  const { quoteId = '' } = useParams();
  return QUOTE_REFERENCE.test(quoteId) ? (
    <QuoteByReference reference={quoteId.toUpperCase()} />
  ) : (
    <QuoteCompare />
  );
}

/** Finds the customer's own quote with this reference and opens its comparison. */
function QuoteByReference({ reference }: { reference: string }) {
  const { versionNumber = '' } = useParams();
  const quotes = useQuery(quotesQueryOptions({ q: reference }));
  if (quotes.isPending) return <LoadingScreen label="Finding the quote" />;
  const found = quotes.data?.items.find((item) => item.reference === reference);
  if (found && /^\d+$/.test(versionNumber)) {
    return (
      <Navigate replace to={paths.account.quoteCompare.getHref(found.id, Number(versionNumber))} />
    );
  }
  return (
    <MyQuoteLoadError
      error={quotes.isError ? quotes.error : null}
      onRetry={() => void quotes.refetch()}
      missingText={`You have no quote ${reference}. Sign in with the address the e-mail was sent to.`}
    />
  );
}

function QuoteCompare() {
  const { quoteId = '', versionNumber = '' } = useParams();
  const number = /^\d+$/.test(versionNumber) ? Number(versionNumber) : NaN;
  const quote = useQuery(quoteQueryOptions(quoteId));
  const workshop = useQuery(workshopQueryOptions());
  const bookings = useQuery(bookingsQueryOptions());
  const [bookingBefore, setBookingBefore] = useState<Booking | null>(null);
  const booking = activeBookingOf(bookings.data?.items ?? [], quoteId);
  const backLink = (
    <Link component={RouterLink} to={paths.account.quote.getHref(quoteId)}>
      Back to quote
    </Link>
  );

  if (quote.isPending) return <LoadingScreen label="Loading the quote" />;
  if (quote.isError) {
    return <MyQuoteLoadError error={quote.error} onRetry={() => void quote.refetch()} />;
  }

  const after = quote.data.versions.find((version) => version.number === number);
  const before = after ? previousVersion(quote.data.versions, after.number) : null;
  const latestNumber = Math.max(...quote.data.versions.map((version) => version.number));
  if (!after || !before) {
    return (
      <>
        <PageHeader title={`Quote ${quote.data.reference}`} lead={backLink} />
        <Alert severity="warning">
          {after
            ? `Version ${after.number} is the first version of this quote: there is nothing before it to compare.`
            : `Quote ${quote.data.reference} has no version ${versionNumber}.`}
        </Alert>
      </>
    );
  }

  return (
    <>
      <PageHeader
        title={`Quote ${quote.data.reference}: version ${after.number}`}
        lead={
          <>
            The workshop revised your quote. Compare it with version {before.number}, then accept or
            decline it. {backLink}
          </>
        }
      />
      <Box sx={{ display: 'grid', gap: 3, gridTemplateColumns: 'minmax(0, 1fr)' }}>
        <VersionCompare
          before={before}
          after={after}
          afterIsLatest={after.number === latestNumber}
          timeZone={workshop.data?.timeZone}
        >
          <CompareAnswer
            quote={quote.data}
            version={after}
            onAccepting={() => setBookingBefore(booking ?? null)}
            onAccepted={() => void bookings.refetch()}
            newerVersionLink={(newer) => (
              <Button
                component={RouterLink}
                to={paths.account.quoteCompare.getHref(quote.data.id, newer)}
                color="inherit"
                variant="outlined"
                size="small"
              >
                Compare version {newer}
              </Button>
            )}
            afterAccepting={
              <AcceptedBookingOutcome
                booking={booking}
                before={bookingBefore}
                versionNumber={after.number}
                // Checking until the booking read back is on the accepted version; a later
                // refresh keeps the outcome (and its pay button) on screen.
                loading={
                  bookings.isPending ||
                  (bookings.isFetching &&
                    booking !== undefined &&
                    booking.quote.versionNumber !== after.number)
                }
                bookingHref={(id) => paths.account.booking.getHref(id)}
                bookHref={paths.plan.book.getHref(quote.data.id)}
                payDifference={(active) => <PayTopUp booking={active} label="Pay the difference" />}
              />
            }
          />
        </VersionCompare>
      </Box>
    </>
  );
}
