import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Chip from '@mui/material/Chip';
import Paper from '@mui/material/Paper';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { useId, type ReactNode } from 'react';
import { visuallyHidden } from '@/components/ui/visually-hidden';
import { formatCents } from '@/lib/money';
import type { QuoteVersion } from '@/types/api';
import { diffVersions, type LineDiff, type LineField, type TotalDiff } from '../utils/version-diff';
import { QuoteVersionPanel } from './quote-version-panel';

/** 210 → "3 h 30", 45 → "45 min". */
function minutesText(minutes: number): string {
  const whole = Math.max(0, Math.round(Math.abs(minutes)));
  const hours = Math.floor(whole / 60);
  const rest = whole % 60;
  if (hours === 0) return `${rest} min`;
  return rest === 0 ? `${hours} h` : `${hours} h ${String(rest).padStart(2, '0')}`;
}

function valueText(total: Pick<TotalDiff, 'unit'>, value: number): string {
  return total.unit === 'cents' ? formatCents(value) : minutesText(value);
}

function differenceText(total: TotalDiff): string {
  if (total.difference === 0) return 'no change';
  const sign = total.difference > 0 ? '+' : '\u2212';
  const size =
    total.unit === 'cents'
      ? formatCents(Math.abs(total.difference))
      : minutesText(total.difference);
  return `${sign}${size}`;
}

const totalLabels: Record<TotalDiff['key'], string> = {
  subtotal: 'Subtotal',
  'bundle-discount': 'Package discount',
  'workshop-discount': 'Workshop discount',
  total: 'Total',
  deposit: 'Deposit',
  balance: 'Balance due on the day',
  labour: 'Labour charged',
  'workshop-time': 'Workshop time',
};

const changeLabels: Record<LineDiff['change'], string> = {
  added: 'Added',
  removed: 'Removed',
  changed: 'Changed',
  unchanged: 'Unchanged',
};

const changeColours: Record<LineDiff['change'], 'success' | 'error' | 'warning' | 'default'> = {
  added: 'success',
  removed: 'error',
  changed: 'warning',
  unchanged: 'default',
};

function fieldText(field: LineField, line: LineDiff): string {
  const { before, after } = line;
  if (!before || !after) return '';
  switch (field) {
    case 'quantity':
      return `quantity ${before.quantity} → ${after.quantity}`;
    case 'unitPriceCents':
      return `price each ${formatCents(before.unitPriceCents)} → ${formatCents(after.unitPriceCents)}`;
    case 'labourMinutes':
      return `labour ${minutesText(before.labourMinutes)} → ${minutesText(after.labourMinutes)} each`;
    case 'amountCents':
      return `line ${formatCents(before.amountCents)} → ${formatCents(after.amountCents)}`;
  }
}

function lineText(line: LineDiff): string {
  if (line.change === 'added' && line.after) {
    return `${line.after.quantity} × ${formatCents(line.after.unitPriceCents)}, ${formatCents(line.after.amountCents)}`;
  }
  if (line.change === 'removed' && line.before) {
    return `Was ${line.before.quantity} × ${formatCents(line.before.unitPriceCents)}, ${formatCents(line.before.amountCents)}`;
  }
  if (line.change === 'changed') {
    const text = line.changedFields.map((field) => fieldText(field, line)).join('; ');
    return text.charAt(0).toUpperCase() + text.slice(1);
  }
  return line.after ? `${line.after.quantity} × ${formatCents(line.after.unitPriceCents)}` : '';
}

interface Props {
  before: QuoteVersion;
  after: QuoteVersion;
  /** Whether `after` is the quote's latest version. */
  afterIsLatest: boolean;
  /** The workshop's IANA time zone, for the dates and times shown. */
  timeZone?: string;
  /** Shown between what changed and the versions in full (the customer's answer). */
  children?: ReactNode;
}

/**
 * Two versions of a quote: first what changed (lines added, removed or changed, marked in words
 * as well as colour; the totals, deposit, labour and workshop time), then both versions in full,
 * side by side on wide screens and one after the other on phones.
 */
export function VersionCompare({ before, after, afterIsLatest, timeZone, children }: Props) {
  const diff = diffVersions(before, after);
  const changesId = useId();
  const linesId = useId();
  const totalsId = useId();
  const versionsId = useId();
  const changedLines = diff.lines.filter((line) => line.change !== 'unchanged');
  const unchangedCount = diff.lines.length - changedLines.length;
  const totals = diff.totals.filter(
    (total) =>
      !(
        (total.key === 'bundle-discount' || total.key === 'workshop-discount') &&
        total.before === 0 &&
        total.after === 0
      ),
  );
  const money = { textAlign: 'right', whiteSpace: 'nowrap', fontVariantNumeric: 'tabular-nums' };

  return (
    <Box sx={{ display: 'grid', gap: 3, gridTemplateColumns: 'minmax(0, 1fr)' }}>
      {after.revisionReason && (
        <Alert severity="info" role="note">
          <strong>Why the workshop revised it:</strong> {after.revisionReason}
        </Alert>
      )}

      <Card component="section" aria-labelledby={changesId}>
        <CardContent sx={{ display: 'grid', gap: 2.5, p: { xs: 2, sm: 2.5 } }}>
          <Typography id={changesId} variant="h2">
            What changed from version {before.number} to version {after.number}
          </Typography>

          <Box component="section" aria-labelledby={linesId}>
            <Typography id={linesId} variant="h3" sx={{ mb: 1 }}>
              Parts and services
            </Typography>
            {changedLines.length === 0 ? (
              <Typography color="text.secondary">
                The same parts and services, in the same quantities.
              </Typography>
            ) : (
              <Box component="ul" sx={{ m: 0, p: 0, display: 'grid', gap: 1.25 }}>
                {changedLines.map((line) => (
                  <Box
                    component="li"
                    key={line.key}
                    sx={{ listStyle: 'none', display: 'flex', gap: 1, alignItems: 'flex-start' }}
                  >
                    <Chip
                      size="small"
                      variant="outlined"
                      color={changeColours[line.change]}
                      label={changeLabels[line.change]}
                      sx={{ flexShrink: 0, minWidth: 84, bgcolor: 'background.paper' }}
                    />
                    <Box sx={{ minWidth: 0 }}>
                      <Typography
                        sx={{
                          fontWeight: 500,
                          textDecoration: line.change === 'removed' ? 'line-through' : undefined,
                        }}
                      >
                        {line.name}
                      </Typography>
                      <Typography variant="body2" color="text.secondary">
                        {lineText(line)}
                      </Typography>
                    </Box>
                  </Box>
                ))}
              </Box>
            )}
            {unchangedCount > 0 && changedLines.length > 0 && (
              <Typography variant="body2" color="text.secondary" sx={{ mt: 1 }}>
                {unchangedCount} other {unchangedCount === 1 ? 'line is' : 'lines are'} unchanged.
              </Typography>
            )}
          </Box>

          <Box component="section" aria-labelledby={totalsId}>
            <Typography id={totalsId} variant="h3" sx={{ mb: 1 }}>
              Totals, deposit and workshop time
            </Typography>
            <Paper variant="outlined" sx={{ overflowX: 'auto', borderRadius: 2 }}>
              <Table size="small" sx={{ '& td, & th': { px: { xs: 1, sm: 2 } } }}>
                <Box component="caption" sx={visuallyHidden}>
                  Totals of version {before.number} and version {after.number}
                </Box>
                <TableHead>
                  <TableRow>
                    <TableCell scope="col">
                      <Box component="span" sx={visuallyHidden}>
                        Figure
                      </Box>
                    </TableCell>
                    <TableCell scope="col" sx={money}>
                      Version {before.number}
                    </TableCell>
                    <TableCell scope="col" sx={money}>
                      Version {after.number}
                    </TableCell>
                  </TableRow>
                </TableHead>
                <TableBody>
                  {totals.map((total) => {
                    const strong = total.key === 'total' || total.key === 'deposit';
                    return (
                      <TableRow key={total.key} data-total={total.key}>
                        <TableCell
                          component="th"
                          scope="row"
                          sx={{ fontWeight: strong ? 700 : 400 }}
                        >
                          {totalLabels[total.key]}
                        </TableCell>
                        <TableCell sx={{ ...money, color: 'text.secondary' }}>
                          {valueText(total, total.before)}
                        </TableCell>
                        <TableCell sx={{ ...money, fontWeight: strong ? 700 : 400 }}>
                          {valueText(total, total.after)}
                          <Box
                            component="span"
                            sx={{
                              display: 'block',
                              fontSize: '0.8rem',
                              fontWeight: 400,
                              color: 'text.secondary',
                            }}
                          >
                            {differenceText(total)}
                          </Box>
                        </TableCell>
                      </TableRow>
                    );
                  })}
                </TableBody>
              </Table>
            </Paper>
          </Box>
        </CardContent>
      </Card>

      {children}

      <Box component="section" aria-labelledby={versionsId}>
        <Typography id={versionsId} variant="h2" sx={{ mb: 1.5 }}>
          Both versions in full
        </Typography>
        <Box
          sx={{
            display: 'grid',
            gap: 2,
            gridTemplateColumns: { xs: 'minmax(0, 1fr)', md: 'repeat(2, minmax(0, 1fr))' },
            alignItems: 'start',
          }}
        >
          <QuoteVersionPanel
            version={before}
            latest={false}
            timeZone={timeZone}
            headingId={`${versionsId}-v${before.number}`}
          />
          <QuoteVersionPanel
            version={after}
            latest={afterIsLatest}
            timeZone={timeZone}
            headingId={`${versionsId}-v${after.number}`}
          />
        </Box>
      </Box>
    </Box>
  );
}
