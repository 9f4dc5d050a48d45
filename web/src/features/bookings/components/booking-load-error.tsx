import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import { Link as RouterLink } from 'react-router';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { isApiError } from '@/lib/api-client';

interface Props {
  error: unknown;
  onRetry: () => void;
}

/** A booking that could not be read: not the customer's (404), or the request failed. */
export function BookingLoadError({ error, onRetry }: Props) {
  const missing = isApiError(error) && error.statusCode === 404;
  return (
    <>
      <PageHeader title={missing ? 'Booking not found' : 'The booking could not be loaded'} />
      <Alert
        severity="error"
        action={
          missing ? undefined : (
            <Button color="inherit" onClick={onRetry}>
              Try again
            </Button>
          )
        }
      >
        {missing
          ? 'There is no booking of yours at this address.'
          : isApiError(error)
            ? error.message
            : 'Please try again.'}
      </Alert>
      <Link
        component={RouterLink}
        to={paths.account.bookings.getHref()}
        sx={{ display: 'inline-block', mt: 2 }}
      >
        Back to my bookings
      </Link>
    </>
  );
}
