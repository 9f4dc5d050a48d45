import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Divider from '@mui/material/Divider';
import Typography from '@mui/material/Typography';
import PictureAsPdfOutlined from '@mui/icons-material/PictureAsPdfOutlined';
import type { ReactNode } from 'react';
import { FitReportPanel } from '@/components/quote/fit-report-panel';
import { PriceBreakdown } from '@/components/quote/price-breakdown';
import { visuallyHidden } from '@/components/ui/visually-hidden';
import { roleLabels } from '@/config/roles';
import { formatCalendarDate, formatDateTime } from '@/lib/format';
import type { QuoteVersion } from '@/types/api';
import { QuoteStateChip } from './quote-state-chip';

interface Props {
  version: QuoteVersion;
  latest: boolean;
  /** The workshop's IANA time zone, for the dates and times shown. */
  timeZone?: string;
  /** Buttons for this version (accept/decline, send). */
  actions?: ReactNode;
  /** Set when the heading is drawn elsewhere (a tab names the version). */
  hideHeading?: boolean;
  headingId?: string;
}

/** One version of a quote: state, who made it and why, every line, the totals and the report. */
export function QuoteVersionPanel({
  version,
  latest,
  timeZone,
  actions,
  hideHeading = false,
  headingId,
}: Props) {
  return (
    <Card component="section" aria-labelledby={headingId} sx={{ minWidth: 0 }}>
      <CardContent sx={{ display: 'grid', gap: 2, p: { xs: 2, sm: 2.5 } }}>
        <Box>
          <Box sx={{ display: 'flex', flexWrap: 'wrap', alignItems: 'center', gap: 1 }}>
            {/* With tabs the tab names the version; the heading stays for the page outline. */}
            <Typography
              id={headingId}
              variant="h2"
              component="h3"
              sx={hideHeading ? visuallyHidden : { fontSize: '1.2rem' }}
            >
              Version {version.number}
              {latest ? ' (latest)' : ''}
            </Typography>
            <QuoteStateChip state={version.state} />
          </Box>
          <Typography variant="body2" color="text.secondary" sx={{ mt: 0.75 }}>
            Made {formatDateTime(version.createdAt, timeZone)} by {version.createdBy.name} (
            {roleLabels[version.createdBy.role].toLowerCase()})
          </Typography>
          <Typography variant="body2" sx={{ mt: 0.25 }}>
            {version.state === 'expired' ? 'Expired on ' : 'Prices hold until '}
            <strong>{formatCalendarDate(version.validUntilDate)}</strong>
          </Typography>
          {version.revisionReason && (
            <Alert severity="info" role="note" sx={{ mt: 1.5 }}>
              <strong>Why it was revised:</strong> {version.revisionReason}
            </Alert>
          )}
        </Box>

        <PriceBreakdown price={version.price} caption={`Version ${version.number}, line by line`} />

        <Divider />
        <Box>
          <Typography variant="h3" component="h4" sx={{ mb: 1 }}>
            Fit report
          </Typography>
          <FitReportPanel report={version.fitReport} headingLevel="h5" onlyFindings />
        </Box>

        <Box sx={{ display: 'flex', flexWrap: 'wrap', gap: 1 }}>
          <Button
            component="a"
            href={version.pdfUrl}
            target="_blank"
            rel="noopener"
            variant="outlined"
            startIcon={<PictureAsPdfOutlined aria-hidden />}
          >
            PDF of version {version.number}
          </Button>
          {actions}
        </Box>
      </CardContent>
    </Card>
  );
}
