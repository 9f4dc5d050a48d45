import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import type { Booking } from '@/types/api';
import { auditRows } from '../utils/booking-history';

/**
 * The booking's audit trail, oldest first: when (on the workshop's clock), what, who, and the
 * API's words for it.
 */
export function BookingAuditTrail({ booking }: { booking: Booking }) {
  const rows = auditRows(booking);
  if (rows.length === 0) {
    return <Typography color="text.secondary">Nothing recorded yet.</Typography>;
  }
  return (
    <Box
      component="ol"
      sx={{
        listStyle: 'none',
        m: 0,
        p: 0,
        display: 'grid',
        gap: 1.5,
        borderLeft: 2,
        borderColor: 'divider',
        pl: 2,
      }}
    >
      {rows.map((row) => (
        <Box component="li" key={row.key} sx={{ minWidth: 0 }}>
          <Typography variant="body2" color="text.secondary">
            <time dateTime={row.at}>{row.time}</time> · {row.actor}
          </Typography>
          <Typography sx={{ fontWeight: 500 }}>{row.label}</Typography>
          {row.detail && (
            <Typography variant="body2" sx={{ overflowWrap: 'anywhere' }}>
              {row.detail}
            </Typography>
          )}
        </Box>
      ))}
    </Box>
  );
}
