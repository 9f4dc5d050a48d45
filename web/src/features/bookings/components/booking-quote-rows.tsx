import Link from '@mui/material/Link';
import { Link as RouterLink } from 'react-router';
import { formatCents } from '@/lib/money';
import type { Booking } from '@/types/api';
import { DetailList, DetailRow } from './detail-list';

/** The quote a booking is for: its reference (a link), the vehicle, the total and the deposit. */
export function BookingQuoteRows({ booking, quoteHref }: { booking: Booking; quoteHref: string }) {
  return (
    <DetailList>
      <DetailRow
        label="Quote"
        value={
          <Link component={RouterLink} to={quoteHref}>
            {booking.quote.reference}, version {booking.quote.versionNumber}
          </Link>
        }
      />
      <DetailRow label="Vehicle" value={booking.quote.vehicleName} />
      <DetailRow label="Total" value={<strong>{formatCents(booking.quote.totalCents)}</strong>} />
      <DetailRow label="Deposit" value={formatCents(booking.quote.depositCents)} />
    </DetailList>
  );
}
