import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import type { Booking } from '@/types/api';
import { paymentLines } from '../utils/payment-text';

/**
 * Each payment of the booking (the deposit and any top-ups), oldest first. `paidOnly` for the
 * customer, who needs no list of payment pages they left unpaid.
 */
export function PaymentLines({
  booking,
  paidOnly = false,
}: {
  booking: Booking;
  paidOnly?: boolean;
}) {
  const lines = paymentLines(booking, { paidOnly });
  if (lines.length === 0) return null;
  return (
    <Box
      component="ul"
      aria-label="Each payment"
      sx={{ listStyle: 'none', m: 0, mt: 1.5, p: 0, display: 'grid', gap: 1 }}
    >
      {lines.map((line) => (
        <Box
          component="li"
          key={line.id}
          sx={{ borderTop: 1, borderColor: 'divider', pt: 1, minWidth: 0 }}
        >
          <Box sx={{ display: 'flex', justifyContent: 'space-between', gap: 1, flexWrap: 'wrap' }}>
            <Typography sx={{ fontWeight: 500 }}>{line.label}</Typography>
            <Typography sx={{ fontWeight: 500 }}>{line.amount}</Typography>
          </Box>
          <Typography variant="body2" color="text.secondary">
            {line.status}
            {line.refunded ? ` · ${line.refunded}` : ''}
          </Typography>
        </Box>
      ))}
    </Box>
  );
}
