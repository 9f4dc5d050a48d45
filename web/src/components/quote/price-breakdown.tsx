import Box from '@mui/material/Box';
import Paper from '@mui/material/Paper';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableFooter from '@mui/material/TableFooter';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { visuallyHidden } from '@/components/ui/visually-hidden';
import { formatCalendarDate } from '@/lib/format';
import { formatCents } from '@/lib/money';
import type { PackagePrice, PricedLine } from '@/types/api';

function quantityText(line: PricedLine): string {
  if (line.kind === 'labour' && line.labourMinutes !== undefined) {
    const hours = line.labourMinutes / 60;
    return `${Number.isInteger(hours) ? hours : hours.toFixed(2).replace(/0$/, '')} h`;
  }
  if (line.kind === 'bundle-discount' && line.percent !== undefined) return `${line.percent} %`;
  // The workshop's own discount is an amount, not a count.
  if (line.kind === 'workshop-discount') return '';
  return line.quantity !== undefined ? String(line.quantity) : '';
}

function depositNote(price: PackagePrice): string {
  const { deposit } = price;
  const base =
    deposit.basis === 'percentage'
      ? `${deposit.percentApplied} % of the total`
      : deposit.basis === 'floor'
        ? 'the smallest deposit the workshop takes'
        : deposit.basis === 'cap'
          ? 'the largest deposit the workshop asks'
          : 'the whole total';
  return deposit.specialOrder ? `${base}, as some parts are ordered in for you` : base;
}

interface Props {
  price: PackagePrice;
  /** "YYYY-MM-DD": the last day the prices hold. */
  validUntilDate?: string;
  /** Names the table for assistive technology. */
  caption?: string;
}

/** Every priced line, then subtotal, GST, total, deposit and balance, with the rounding note. */
export function PriceBreakdown({ price, validUntilDate, caption = 'Price, line by line' }: Props) {
  const money = { textAlign: 'right', whiteSpace: 'nowrap', fontVariantNumeric: 'tabular-nums' };
  return (
    <Box>
      <Paper variant="outlined" sx={{ overflowX: 'auto', borderRadius: 2 }}>
        <Table size="small" sx={{ '& td, & th': { px: { xs: 1, sm: 2 } } }}>
          <Box component="caption" sx={visuallyHidden}>
            {caption}
          </Box>
          <TableHead>
            <TableRow>
              <TableCell scope="col">Item</TableCell>
              <TableCell scope="col" sx={{ textAlign: 'right' }}>
                Qty
              </TableCell>
              <TableCell scope="col" sx={{ textAlign: 'right' }}>
                Amount
              </TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {price.lines.map((line, index) => (
              <TableRow key={`${line.kind}-${line.productId ?? ''}-${index}`}>
                <TableCell sx={{ pl: line.kind === 'labour' ? { xs: 2, sm: 4 } : undefined }}>
                  {line.description}
                  {line.specialOrder && (
                    <Typography component="span" variant="body2" color="text.secondary">
                      {' '}
                      (ordered in, about {line.leadDays} days)
                    </Typography>
                  )}
                </TableCell>
                <TableCell sx={money}>{quantityText(line)}</TableCell>
                <TableCell
                  sx={{
                    ...money,
                    ...(line.kind === 'workshop-discount' || line.kind === 'bundle-discount'
                      ? { color: 'success.dark', fontWeight: 500 }
                      : {}),
                  }}
                >
                  {formatCents(line.amountCents)}
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
          <TableFooter
            sx={{ '& td, & th': { color: 'text.primary', fontSize: '0.95rem', borderBottom: 0 } }}
          >
            <TableRow sx={{ '& > *': { borderTop: 2, borderColor: 'divider' } }}>
              <TableCell component="th" scope="row" colSpan={2}>
                Subtotal
              </TableCell>
              <TableCell sx={money}>{formatCents(price.subtotalCents)}</TableCell>
            </TableRow>
            <TableRow>
              <TableCell component="th" scope="row" colSpan={2}>
                {price.pricesIncludeTax
                  ? `Includes GST (${price.taxRatePercent} %)`
                  : `GST added (${price.taxRatePercent} %)`}
              </TableCell>
              <TableCell sx={money}>{formatCents(price.taxCents)}</TableCell>
            </TableRow>
            <TableRow>
              <TableCell component="th" scope="row" colSpan={2} sx={{ fontWeight: 700 }}>
                Total
              </TableCell>
              <TableCell sx={{ ...money, fontWeight: 700, fontSize: '1.05rem' }}>
                {formatCents(price.totalCents)}
              </TableCell>
            </TableRow>
            <TableRow>
              <TableCell component="th" scope="row" colSpan={2}>
                Deposit
                <Typography component="span" variant="body2" color="text.secondary">
                  {' '}
                  ({depositNote(price)})
                </Typography>
              </TableCell>
              <TableCell sx={money}>{formatCents(price.depositCents)}</TableCell>
            </TableRow>
            <TableRow>
              <TableCell component="th" scope="row" colSpan={2}>
                Balance due on the day
              </TableCell>
              <TableCell sx={money}>{formatCents(price.balanceDueCents)}</TableCell>
            </TableRow>
          </TableFooter>
        </Table>
      </Paper>
      <Box sx={{ mt: 1.5, display: 'grid', gap: 0.5 }}>
        {validUntilDate && (
          <Typography variant="body2">
            Prices hold until <strong>{formatCalendarDate(validUntilDate)}</strong>.
          </Typography>
        )}
        <Typography variant="body2" color="text.secondary">
          {price.roundingNote}
        </Typography>
      </Box>
    </Box>
  );
}
