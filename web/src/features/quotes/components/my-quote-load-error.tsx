import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import { Link as RouterLink } from 'react-router';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { isApiError } from '@/lib/api-client';

/**
 * A customer's quote page that has no quote to show: not theirs or not there (404, with
 * `missingText`), or not loaded (the API's words and "Try again"); always a way back to My quotes.
 */
export function MyQuoteLoadError({
  error,
  onRetry,
  missingText = 'There is no quote of yours at this address.',
}: {
  /** The failed request's error; null when the quote was looked for and not found. */
  error: unknown;
  onRetry: () => void;
  missingText?: string;
}) {
  const missing = error === null || (isApiError(error) && error.statusCode === 404);
  return (
    <>
      <PageHeader title={missing ? 'Quote not found' : 'The quote could not be loaded'} />
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
        {missing ? missingText : isApiError(error) ? error.message : 'Please try again.'}
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
