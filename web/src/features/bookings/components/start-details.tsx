import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';
import type { PlannedSegment } from '@/types/api';
import {
  formatLocalDateTime,
  formatLocalRange,
  overnightNote,
  segmentTitle,
} from '../utils/booking-text';

interface Props {
  /** The instants of the whole job and of each stay in a bay. */
  startUtc: string;
  endUtc: string;
  segments: readonly PlannedSegment[];
  /** The workshop's IANA zone: every time is shown on its clock. */
  timeZone: string;
  /** The heading's level in the page outline. */
  headingComponent?: 'h2' | 'h3';
  title?: string;
  headingId?: string;
  children?: ReactNode;
}

/**
 * What a start covers: drop-off and pick-up on the workshop's clock, each bay with its own
 * from–to, and a note when the vehicle stays in overnight.
 */
export function StartDetails({
  startUtc,
  endUtc,
  segments,
  timeZone,
  headingComponent = 'h3',
  title = 'What this time covers',
  headingId,
  children,
}: Props) {
  const overnight = overnightNote(startUtc, endUtc, timeZone);
  return (
    <Box sx={{ display: 'grid', gap: 1.5 }}>
      <Typography id={headingId} variant="h3" component={headingComponent}>
        {title}
      </Typography>
      <Typography>
        Bring the vehicle in for <strong>{formatLocalDateTime(startUtc, timeZone)}</strong>. The
        work should be done by <strong>{formatLocalDateTime(endUtc, timeZone)}</strong>.
      </Typography>
      <Box component="ol" sx={{ m: 0, pl: 2.5, display: 'grid', gap: 0.75 }}>
        {segments.map((segment) => (
          <li key={`${segment.bayId}-${segment.startUtc}`}>
            <Typography component="span" sx={{ fontWeight: 500, display: 'block' }}>
              {segmentTitle(segment)}
            </Typography>
            <Typography component="span" variant="body2" color="text.secondary">
              {formatLocalRange(segment.startUtc, segment.endUtc, timeZone)}
            </Typography>
          </li>
        ))}
      </Box>
      {overnight && (
        <Alert severity="info" role="note">
          {overnight}
        </Alert>
      )}
      <Typography variant="body2" color="text.secondary">
        Times are the workshop&apos;s local time ({timeZone.replace(/_/g, ' ')}).
      </Typography>
      {children}
    </Box>
  );
}
