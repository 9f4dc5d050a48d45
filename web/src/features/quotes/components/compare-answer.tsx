import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import CircularProgress from '@mui/material/CircularProgress';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogContentText from '@mui/material/DialogContentText';
import DialogTitle from '@mui/material/DialogTitle';
import Typography from '@mui/material/Typography';
import { useId, useState, type ReactNode } from 'react';
import { CautionsPanel } from '@/components/quote/fit-report-panel';
import { isApiError } from '@/lib/api-client';
import { formatCalendarDate } from '@/lib/format';
import { formatCents } from '@/lib/money';
import type { Quote, QuoteVersion } from '@/types/api';
import { useRespondToQuote } from '../api/respond-to-quote';
import { answerRefusal } from '../utils/answer-refusal';

interface Props {
  quote: Quote;
  version: QuoteVersion;
  /** Called just before an acceptance is sent (the page notes the booking as it was). */
  onAccepting?: () => void;
  /** Called once the version is accepted. */
  onAccepted?: () => void;
  /** Shown under the answer once the version is accepted: what happens to the booking. */
  afterAccepting?: ReactNode;
  /** Where to look at a newer version that replaced this one. */
  newerVersionLink?: (versionNumber: number) => ReactNode;
}

/**
 * The customer's answer to a revised version: the cautions, then Accept (at once) or Decline
 * (after asking). A refusal from the server (409: replaced, expired, already answered) is said in
 * plain words from the quote as it now stands.
 */
export function CompareAnswer({
  quote,
  version,
  onAccepting,
  onAccepted,
  afterAccepting,
  newerVersionLink,
}: Props) {
  const respond = useRespondToQuote();
  const [confirmDecline, setConfirmDecline] = useState(false);
  const headingId = useId();
  const titleId = useId();
  const textId = useId();
  const refusal = answerRefusal(quote, version.number);
  const answeredHere = respond.isSuccess;
  const refusedHere = respond.isError;
  const refusedMessage = refusedHere
    ? (isApiError(respond.error) && respond.error.statusCode === 409 && refusal?.message) ||
      (isApiError(respond.error)
        ? respond.error.message
        : 'Your answer could not be sent. Please try again.')
    : null;

  const accept = () => {
    onAccepting?.();
    respond.mutate(
      { quoteId: quote.id, versionNumber: version.number, action: 'accept' },
      { onSuccess: () => onAccepted?.() },
    );
  };
  const decline = () => {
    respond.mutate(
      { quoteId: quote.id, versionNumber: version.number, action: 'decline' },
      { onSettled: () => setConfirmDecline(false) },
    );
  };

  return (
    <Card component="section" aria-labelledby={headingId}>
      <CardContent sx={{ display: 'grid', gap: 2, p: { xs: 2, sm: 2.5 } }}>
        <Typography id={headingId} variant="h2">
          Your answer to version {version.number}
        </Typography>
        <Typography>
          Version {version.number} comes to{' '}
          <strong data-testid="compare-total">{formatCents(version.price.totalCents)}</strong>, with
          a deposit of <strong>{formatCents(version.price.depositCents)}</strong>. Its prices hold
          until {formatCalendarDate(version.validUntilDate)}.
        </Typography>

        <CautionsPanel report={version.fitReport} />

        {version.state === 'accepted' ? (
          <Alert severity="success" role="status">
            <AlertTitle>
              {answeredHere
                ? 'Thank you: version accepted'
                : `Version ${version.number} is accepted`}
            </AlertTitle>
            The workshop works to version {version.number} from now on.
          </Alert>
        ) : version.state === 'declined' ? (
          <Alert severity="info" role="status">
            {answeredHere
              ? `You declined version ${version.number}. The workshop will see your answer; you can plan a new build at any time.`
              : refusal?.message}
          </Alert>
        ) : refusal ? (
          <Alert severity="warning" role="status">
            {refusal.message}
            {refusal.latestVersionNumber !== undefined && newerVersionLink && (
              <Box sx={{ mt: 1 }}>{newerVersionLink(refusal.latestVersionNumber)}</Box>
            )}
          </Alert>
        ) : (
          <Box sx={{ display: 'flex', gap: 1.5, flexWrap: 'wrap' }}>
            <Button
              variant="contained"
              size="large"
              onClick={accept}
              disabled={respond.isPending}
              aria-busy={respond.isPending || undefined}
              startIcon={
                respond.isPending ? (
                  <CircularProgress size={18} color="inherit" aria-hidden />
                ) : undefined
              }
            >
              Accept version {version.number}
            </Button>
            <Button
              variant="outlined"
              color="error"
              size="large"
              onClick={() => setConfirmDecline(true)}
              disabled={respond.isPending}
            >
              Decline
            </Button>
          </Box>
        )}

        {/* A refusal the refreshed quote explains is said once, in the notice above. */}
        {refusedMessage && !confirmDecline && !(refusal && refusedMessage === refusal.message) && (
          <Alert severity="error">
            <AlertTitle>Your answer was not taken</AlertTitle>
            {refusedMessage}
          </Alert>
        )}

        {version.state === 'accepted' && afterAccepting}
      </CardContent>

      <Dialog
        open={confirmDecline}
        onClose={() => !respond.isPending && setConfirmDecline(false)}
        aria-labelledby={titleId}
        aria-describedby={textId}
      >
        <DialogTitle id={titleId}>Decline version {version.number}?</DialogTitle>
        <DialogContent>
          <DialogContentText id={textId}>
            The workshop will see that you do not want this version of quote {quote.reference}, and
            will be in touch about what happens next.
          </DialogContentText>
          {refusedMessage && (
            <Alert severity="error" sx={{ mt: 2 }}>
              {refusedMessage}
            </Alert>
          )}
        </DialogContent>
        <DialogActions>
          <Button onClick={() => setConfirmDecline(false)} disabled={respond.isPending}>
            Keep it open
          </Button>
          <Button variant="contained" color="error" onClick={decline} disabled={respond.isPending}>
            Decline version {version.number}
          </Button>
        </DialogActions>
      </Dialog>
    </Card>
  );
}
