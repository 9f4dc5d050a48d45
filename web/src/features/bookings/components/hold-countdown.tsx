import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import TimerOutlined from '@mui/icons-material/TimerOutlined';
import { useEffect, useRef } from 'react';
import { visuallyHidden } from '@/components/ui/visually-hidden';
import { useNow } from '../hooks/use-now';
import { holdCountdownText, minutesLeft } from '../utils/booking-text';

/** Whole minutes left at which the countdown is read out (not every second). */
const ANNOUNCE_AT_MINUTES = new Set([10, 5, 2, 1]);

interface Props {
  holdExpiresAt: string;
  /** Called once when the hold runs out (the page asks the API for the booking again). */
  onExpired: () => void;
}

/**
 * "Held for 14:32 more", ticking each second, then "This hold has expired". The clock itself
 * is a timer (not read out on every tick); a few milestones are announced politely.
 */
export function HoldCountdown({ holdExpiresAt, onExpired }: Props) {
  const expiresAtMs = Date.parse(holdExpiresAt);
  const now = useNow(1000, true);
  const msLeft = Number.isNaN(expiresAtMs) ? 0 : expiresAtMs - now;
  const expired = msLeft <= 0;
  const minutes = minutesLeft(msLeft);
  const reported = useRef(false);
  const onExpiredRef = useRef(onExpired);

  useEffect(() => {
    onExpiredRef.current = onExpired;
  }, [onExpired]);

  useEffect(() => {
    if (expired && !reported.current) {
      reported.current = true;
      onExpiredRef.current();
    }
    if (!expired) reported.current = false;
  }, [expired]);

  const announcement = expired
    ? 'This hold has expired.'
    : ANNOUNCE_AT_MINUTES.has(minutes)
      ? `${minutes} minute${minutes === 1 ? '' : 's'} left on the hold.`
      : '';

  return (
    <Alert
      severity={expired ? 'error' : 'warning'}
      icon={<TimerOutlined aria-hidden />}
      sx={{ alignItems: 'center' }}
    >
      <Typography
        role="timer"
        aria-live="off"
        sx={{ fontWeight: 500, fontVariantNumeric: 'tabular-nums' }}
      >
        {holdCountdownText(msLeft)}
      </Typography>
      {!expired && (
        <Typography variant="body2">
          After that the time is let go and others can book it.
        </Typography>
      )}
      <Box sx={visuallyHidden} role="status">
        {announcement}
      </Box>
    </Alert>
  );
}
