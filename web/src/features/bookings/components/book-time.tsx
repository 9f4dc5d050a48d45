import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import CircularProgress from '@mui/material/CircularProgress';
import Link from '@mui/material/Link';
import Paper from '@mui/material/Paper';
import Typography from '@mui/material/Typography';
import EventAvailableOutlined from '@mui/icons-material/EventAvailableOutlined';
import { useId } from 'react';
import { Link as RouterLink, useNavigate } from 'react-router';
import { visuallyHidden } from '@/components/ui/visually-hidden';
import { paths } from '@/config/paths';
import { isApiError } from '@/lib/api-client';
import { useCreateBooking } from '../api/create-booking';
import { useStartChoice } from '../hooks/use-start-choice';
import { bookingConflictOf } from '../utils/booking-answers';
import { formatLocalDate, formatLocalTime, localDateOf } from '../utils/booking-text';
import { ConflictAlternatives } from './conflict-alternatives';
import { JobPlanSummary } from './job-plan-summary';
import { StartDetails } from './start-details';
import { StartPicker } from './start-picker';

interface Props {
  quoteVersionId: string;
  quoteReference: string;
  /** The quote's page, for "cannot be booked" and going back. */
  quoteHref: string;
}

function errorMessage(error: unknown, fallback: string): string {
  if (!isApiError(error)) return fallback;
  const details = Object.values(error.fieldErrors).flat();
  return details.length > 0 ? details.join(' ') : error.message;
}

/**
 * Booking a quote: what the job needs, a day and a start time, what that time covers, then
 * "Hold this time". A refused time shows the next free ones; a quote that cannot be booked
 * (expired, replaced, declined) says why, with a link back to it.
 */
export function BookTime({ quoteVersionId, quoteReference, quoteHref }: Props) {
  const choice = useStartChoice(quoteVersionId);
  const createBooking = useCreateBooking();
  const navigate = useNavigate();
  const needsHeadingId = useId();
  const detailsHeadingId = useId();
  const { base, availability, start } = choice;

  if (base.isPending) {
    return (
      <Box role="status" sx={{ display: 'flex', gap: 1.5, alignItems: 'center' }}>
        <CircularProgress size={24} aria-hidden />
        <Typography>Finding the free times in the workshop…</Typography>
      </Box>
    );
  }
  if (base.isError) {
    const status = isApiError(base.error) ? base.error.statusCode : 0;
    if (status === 409 || status === 404) {
      return (
        <Alert severity="warning">
          <AlertTitle>
            {status === 409
              ? `Quote ${quoteReference} cannot be booked`
              : 'This quote was not found'}
          </AlertTitle>
          {errorMessage(base.error, 'This quote cannot be booked.')}{' '}
          <Link component={RouterLink} to={quoteHref}>
            Open quote {quoteReference}
          </Link>
        </Alert>
      );
    }
    return (
      <Alert
        severity="error"
        action={
          <Button color="inherit" onClick={() => void base.refetch()}>
            Try again
          </Button>
        }
      >
        {errorMessage(base.error, 'The free times could not be loaded.')}
      </Alert>
    );
  }

  const shown = availability ?? base.data;
  const timeZone = shown.timeZone;
  // A refusal is about the time it was for: picking another time puts it away.
  const failedForShown =
    createBooking.isError && (!start || createBooking.variables?.start === start.startUtc);
  const conflict = failedForShown ? bookingConflictOf(createBooking.error) : null;

  const hold = () => {
    if (!start) return;
    createBooking.mutate(
      { quoteVersionId, start: start.startUtc },
      { onSuccess: (booking) => void navigate(paths.account.booking.getHref(booking.id)) },
    );
  };

  return (
    <>
      <Box component="section" aria-labelledby={needsHeadingId}>
        <Typography id={needsHeadingId} variant="h2" sx={{ mb: 1 }}>
          What the job needs
        </Typography>
        <JobPlanSummary plan={shown.plan} />
      </Box>

      {shown.plan.segments.length > 0 && (
        <>
          {choice.current.isError ? (
            <Alert
              severity="error"
              action={
                <Button color="inherit" onClick={() => void choice.current.refetch()}>
                  Try again
                </Button>
              }
            >
              {errorMessage(choice.current.error, 'The free times could not be loaded.')}
            </Alert>
          ) : (
            <StartPicker choice={choice}>
              {conflict ? (
                <ConflictAlternatives
                  conflict={conflict}
                  timeZone={timeZone}
                  onPick={(next) => {
                    createBooking.reset();
                    choice.pickStart(next);
                  }}
                />
              ) : (
                failedForShown && (
                  <Alert severity="error">
                    <AlertTitle>The time was not held</AlertTitle>
                    {errorMessage(createBooking.error, 'Please try again.')}
                  </Alert>
                )
              )}
              {start && (
                <Paper
                  component="section"
                  variant="outlined"
                  aria-labelledby={detailsHeadingId}
                  sx={{ p: { xs: 2, sm: 2.5 }, borderRadius: 2 }}
                >
                  <StartDetails
                    startUtc={start.startUtc}
                    endUtc={start.endUtc}
                    segments={start.segments}
                    timeZone={timeZone}
                    headingComponent="h2"
                    headingId={detailsHeadingId}
                  >
                    <Typography variant="body2">
                      Holding keeps this time for you for {shown.holdMinutes} minutes. Nothing is
                      paid yet.
                    </Typography>
                    <Box>
                      <Button
                        variant="contained"
                        color="secondary"
                        size="large"
                        onClick={hold}
                        disabled={createBooking.isPending}
                        aria-busy={createBooking.isPending || undefined}
                        startIcon={
                          createBooking.isPending ? (
                            <CircularProgress size={18} color="inherit" aria-hidden />
                          ) : (
                            <EventAvailableOutlined aria-hidden />
                          )
                        }
                      >
                        Hold this time
                      </Button>
                    </Box>
                  </StartDetails>
                </Paper>
              )}
            </StartPicker>
          )}

          <Box sx={visuallyHidden} role="status">
            {start
              ? `Picked ${formatLocalTime(start.startUtc, timeZone)} on ${formatLocalDate(localDateOf(start.startUtc, timeZone))}.`
              : ''}
          </Box>
        </>
      )}
    </>
  );
}
