import Box from '@mui/material/Box';
import Card from '@mui/material/Card';
import CardActionArea from '@mui/material/CardActionArea';
import CardContent from '@mui/material/CardContent';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router';
import { formatCalendarDate } from '@/lib/format';
import { formatCents } from '@/lib/money';
import type { QuoteSummary } from '@/types/api';
import { QuoteStateChip } from './quote-state-chip';

interface Props {
  quotes: readonly QuoteSummary[];
  hrefFor: (quote: QuoteSummary) => string;
  /** Staff lists name the customer on each quote. */
  showCustomer?: boolean;
  /** A line to draw the eye on a quote (e.g. "Revised: compare and answer"), or null. */
  noteFor?: (quote: QuoteSummary) => string | null;
  /** Names the list for assistive technology. */
  'aria-label': string;
}

/** Quotes as cards, newest first: reference, vehicle, latest state, total and valid-until. */
export function QuoteList({ quotes, hrefFor, showCustomer = false, noteFor, ...aria }: Props) {
  return (
    <Box
      component="ul"
      aria-label={aria['aria-label']}
      sx={{
        listStyle: 'none',
        p: 0,
        m: 0,
        display: 'grid',
        gap: 1.5,
        gridTemplateColumns: { xs: '1fr', md: '1fr 1fr' },
      }}
    >
      {quotes.map((quote) => (
        <li key={quote.id}>
          <Card sx={{ height: '100%' }}>
            <CardActionArea component={RouterLink} to={hrefFor(quote)} sx={{ height: '100%' }}>
              <CardContent>
                <Box
                  sx={{
                    display: 'flex',
                    justifyContent: 'space-between',
                    alignItems: 'center',
                    gap: 1,
                  }}
                >
                  <Typography variant="h2" sx={{ fontSize: '1.15rem' }}>
                    Quote {quote.reference}
                  </Typography>
                  <QuoteStateChip state={quote.latestVersion.state} />
                </Box>
                <Typography sx={{ mt: 0.5 }}>{quote.vehicleName}</Typography>
                {noteFor?.(quote) && (
                  <Typography sx={{ mt: 0.5, fontWeight: 500, color: 'info.dark' }}>
                    {noteFor(quote)}
                  </Typography>
                )}
                {showCustomer && (
                  <Typography variant="body2" color="text.secondary">
                    {quote.customer.name} · {quote.customer.email}
                  </Typography>
                )}
                <Box
                  sx={{
                    mt: 1.5,
                    display: 'flex',
                    flexWrap: 'wrap',
                    justifyContent: 'space-between',
                    gap: 1,
                  }}
                >
                  <Typography sx={{ fontWeight: 700 }}>
                    {formatCents(quote.latestVersion.totalCents)}
                  </Typography>
                  <Typography variant="body2" color="text.secondary">
                    {quote.versionCount > 1 ? `Version ${quote.latestVersion.number} · ` : ''}
                    Valid until {formatCalendarDate(quote.latestVersion.validUntilDate)}
                  </Typography>
                </Box>
              </CardContent>
            </CardActionArea>
          </Card>
        </li>
      ))}
    </Box>
  );
}
