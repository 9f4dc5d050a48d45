/**
 * The planner's last step, after the review: book a time in the workshop for a saved quote.
 * It composes the quote (its newest version) with the booking feature's picker.
 */
import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import CircularProgress from '@mui/material/CircularProgress';
import Typography from '@mui/material/Typography';
import { useQuery } from '@tanstack/react-query';
import { Link as RouterLink, useLocation, useParams } from 'react-router';
import { paths } from '@/config/paths';
import { useUser } from '@/features/auth/hooks/use-user';
import { BookTime } from '@/features/bookings/components/book-time';
import { PlannerStep } from '@/features/planner/components/planner-step';
import { quoteQueryOptions } from '@/features/quotes/api/get-quote';
import { isApiError } from '@/lib/api-client';
import { formatCents } from '@/lib/money';
import type { Quote } from '@/types/api';

function newestVersion(quote: Quote) {
  return [...quote.versions].sort((a, b) => b.number - a.number)[0];
}

function BookContent({ quoteId }: { quoteId: string }) {
  const quote = useQuery(quoteQueryOptions(quoteId));
  if (quote.isPending) {
    return (
      <Box role="status" sx={{ display: 'flex', gap: 1.5, alignItems: 'center' }}>
        <CircularProgress size={24} aria-hidden />
        <Typography>Loading the quote…</Typography>
      </Box>
    );
  }
  if (quote.isError) {
    const missing = isApiError(quote.error) && quote.error.statusCode === 404;
    return (
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
            : 'The quote could not be loaded.'}
      </Alert>
    );
  }
  const version = newestVersion(quote.data);
  const quoteHref = paths.account.quote.getHref(quote.data.id);
  if (!version) {
    return <Alert severity="warning">This quote has no version to book.</Alert>;
  }
  return (
    <>
      <Card variant="outlined">
        <CardContent sx={{ display: 'grid', gap: 0.25 }}>
          <Typography sx={{ fontWeight: 500 }}>
            Quote {quote.data.reference}
            {quote.data.versions.length > 1 ? `, version ${version.number}` : ''}
          </Typography>
          <Typography>{quote.data.vehicle.name}</Typography>
          <Typography variant="body2" color="text.secondary">
            Total {formatCents(version.price.totalCents)}, deposit{' '}
            {formatCents(version.price.depositCents)}
          </Typography>
        </CardContent>
      </Card>
      <BookTime
        key={version.id}
        quoteVersionId={version.id}
        quoteReference={quote.data.reference}
        quoteHref={quoteHref}
      />
    </>
  );
}

export default function BookRoute() {
  const { quoteId = '' } = useParams();
  const location = useLocation();
  const { data: user, isPending } = useUser();
  const customer = user?.role === 'customer';
  return (
    <PlannerStep
      step="book"
      lead="Pick a day and a start time for the work. Holding a time keeps it for you for a short while."
      backHref={customer ? paths.account.quote.getHref(quoteId) : undefined}
      backLabel="Back to the quote"
    >
      {isPending ? (
        <Box role="status" sx={{ display: 'flex', gap: 1.5, alignItems: 'center' }}>
          <CircularProgress size={24} aria-hidden />
          <Typography>Checking your sign-in…</Typography>
        </Box>
      ) : !user ? (
        <Alert severity="info">
          <AlertTitle>Sign in to book</AlertTitle>A time is booked for a saved quote of yours.
          <Box sx={{ mt: 1.5, display: 'flex', gap: 1, flexWrap: 'wrap' }}>
            <Button
              component={RouterLink}
              to={paths.auth.signIn.getHref(location.pathname)}
              variant="contained"
            >
              Sign in
            </Button>
          </Box>
        </Alert>
      ) : !customer ? (
        <Alert severity="info">
          Times are booked here by customers, for their own saved quotes.
        </Alert>
      ) : (
        <BookContent quoteId={quoteId} />
      )}
    </PlannerStep>
  );
}
