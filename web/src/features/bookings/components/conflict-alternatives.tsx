import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import type { BookingConflict, StartOption } from '@/types/api';
import { formatLocalTime, formatShortLocalDate, localDateOf } from '../utils/booking-text';

interface Props {
  conflict: BookingConflict;
  timeZone: string;
  onPick: (start: StartOption) => void;
}

/** The API's refusal of a time (taken meanwhile, or not offered) and the next free starts. */
export function ConflictAlternatives({ conflict, timeZone, onPick }: Props) {
  return (
    <Alert severity="warning">
      <AlertTitle>That time could not be kept</AlertTitle>
      {conflict.message}
      {conflict.nextStarts.length > 0 ? (
        <>
          <Box component="p" sx={{ m: 0, mt: 1 }}>
            These times are free. Pick one to see what it covers:
          </Box>
          <Box
            role="group"
            aria-label="Free times instead"
            sx={{ display: 'flex', flexWrap: 'wrap', gap: 1, mt: 1 }}
          >
            {conflict.nextStarts.map((start) => (
              <Button
                key={start.startUtc}
                variant="outlined"
                color="inherit"
                onClick={() => onPick(start)}
                sx={{ bgcolor: 'background.paper' }}
              >
                {formatShortLocalDate(localDateOf(start.startUtc, timeZone))},{' '}
                {formatLocalTime(start.startUtc, timeZone)}
              </Button>
            ))}
          </Box>
        </>
      ) : (
        <Box component="p" sx={{ m: 0, mt: 1 }}>
          No other time is free soon after it. Pick another day.
        </Box>
      )}
    </Alert>
  );
}
