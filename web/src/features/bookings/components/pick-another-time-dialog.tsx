import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import CircularProgress from '@mui/material/CircularProgress';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import Typography from '@mui/material/Typography';
import useMediaQuery from '@mui/material/useMediaQuery';
import { useTheme } from '@mui/material/styles';
import { useId } from 'react';
import { isApiError } from '@/lib/api-client';
import type { Booking } from '@/types/api';
import { useMoveBooking } from '../api/move-booking';
import { useStartChoice } from '../hooks/use-start-choice';
import { bookingConflictOf } from '../utils/booking-answers';
import { ConflictAlternatives } from './conflict-alternatives';
import { StartDetails } from './start-details';
import { StartPicker } from './start-picker';

interface Props {
  booking: Booking;
  onClose: () => void;
  /** The line above the picker; the customer's own wording unless the desk moves it. */
  note?: string;
  /** How the booking's present start is marked among the times. */
  currentLabel?: string;
}

/** The picker inside the dialog: mounted only while the dialog is open, so it asks then. */
function MoveChoice({
  booking,
  onClose,
  titleId,
  note = 'Your hold stays on its present time until you move it.',
  currentLabel,
}: Props & { titleId: string }) {
  const choice = useStartChoice(booking.quote.versionId);
  const move = useMoveBooking();
  const { base, start } = choice;
  const failedForShown = move.isError && (!start || move.variables?.start === start.startUtc);
  const conflict = failedForShown ? bookingConflictOf(move.error) : null;
  const timeZone = choice.availability?.timeZone ?? booking.timeZone;

  return (
    <>
      <DialogTitle id={titleId}>Pick another time for {booking.reference}</DialogTitle>
      <DialogContent sx={{ display: 'grid', gap: 2.5, alignContent: 'start' }}>
        {base.isPending ? (
          <Box role="status" sx={{ display: 'flex', gap: 1.5, alignItems: 'center' }}>
            <CircularProgress size={24} aria-hidden />
            <Typography>Finding the free times…</Typography>
          </Box>
        ) : base.isError ? (
          <Alert severity="error">
            {isApiError(base.error) ? base.error.message : 'The free times could not be loaded.'}
          </Alert>
        ) : (
          <>
            <Typography color="text.secondary">{note}</Typography>
            <StartPicker
              choice={choice}
              currentStartUtc={booking.startUtc}
              currentLabel={currentLabel}
              headingComponent="h3"
            >
              {conflict ? (
                <ConflictAlternatives
                  conflict={conflict}
                  timeZone={timeZone}
                  onPick={(next) => {
                    move.reset();
                    choice.pickStart(next);
                  }}
                />
              ) : (
                failedForShown && (
                  <Alert severity="error">
                    <AlertTitle>The booking was not moved</AlertTitle>
                    {isApiError(move.error) ? move.error.message : 'Please try again.'}
                  </Alert>
                )
              )}
              {start && (
                <StartDetails
                  startUtc={start.startUtc}
                  endUtc={start.endUtc}
                  segments={start.segments}
                  timeZone={timeZone}
                  title="What the new time covers"
                  headingComponent="h3"
                />
              )}
            </StartPicker>
          </>
        )}
      </DialogContent>
      <DialogActions sx={{ px: 3, pb: 2, flexWrap: 'wrap', gap: 1 }}>
        <Button onClick={onClose} disabled={move.isPending}>
          Keep the present time
        </Button>
        <Button
          variant="contained"
          disabled={!start || move.isPending || start.startUtc === booking.startUtc}
          aria-busy={move.isPending || undefined}
          onClick={() => {
            if (!start) return;
            move.mutate({ bookingId: booking.id, start: start.startUtc }, { onSuccess: onClose });
          }}
          startIcon={
            move.isPending ? <CircularProgress size={18} color="inherit" aria-hidden /> : undefined
          }
        >
          Move to this time
        </Button>
      </DialogActions>
    </>
  );
}

/**
 * A booking's new day and time, with the same picker as the Book step: a customer's hold, or
 * any booking the desk moves.
 */
export function PickAnotherTimeDialog({
  booking,
  open,
  onClose,
  ...wording
}: Props & { open: boolean }) {
  const theme = useTheme();
  const phone = useMediaQuery(theme.breakpoints.down('sm'), { noSsr: true });
  const titleId = useId();
  return (
    <Dialog
      open={open}
      onClose={onClose}
      aria-labelledby={titleId}
      fullScreen={phone}
      fullWidth
      maxWidth="md"
    >
      {open && <MoveChoice booking={booking} onClose={onClose} titleId={titleId} {...wording} />}
    </Dialog>
  );
}
