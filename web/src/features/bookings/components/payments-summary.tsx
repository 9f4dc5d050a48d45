import Typography from '@mui/material/Typography';
import type { Booking } from '@/types/api';
import { paymentRows, paymentStatusNote } from '../utils/payment-text';
import { DetailList, DetailRow } from './detail-list';

/**
 * The booking's money as the API records it: the deposit (due, or paid and when), any refund,
 * the balance due, and what became of a payment page that was not completed.
 */
export function PaymentsSummary({ booking }: { booking: Booking }) {
  const note = paymentStatusNote(booking);
  return (
    <>
      <DetailList>
        {paymentRows(booking).map((row) => (
          <DetailRow key={row.label} label={row.label} value={row.value} />
        ))}
      </DetailList>
      {note && (
        <Typography variant="body2" color="text.secondary" sx={{ mt: 1.5 }}>
          {note}
        </Typography>
      )}
    </>
  );
}
