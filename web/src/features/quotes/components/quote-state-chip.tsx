import Chip from '@mui/material/Chip';
import type { QuoteVersionState } from '@/types/api';

export const quoteStateLabels: Record<QuoteVersionState, string> = {
  draft: 'Draft',
  sent: 'Open',
  accepted: 'Accepted',
  superseded: 'Replaced',
  expired: 'Expired',
  declined: 'Declined',
};

const stateColours: Record<
  QuoteVersionState,
  'default' | 'primary' | 'success' | 'warning' | 'error' | 'info'
> = {
  draft: 'default',
  sent: 'info',
  accepted: 'success',
  superseded: 'default',
  expired: 'warning',
  declined: 'error',
};

/** A quote version's state in words and colour. */
export function QuoteStateChip({ state }: { state: QuoteVersionState }) {
  return (
    <Chip
      size="small"
      variant="outlined"
      color={stateColours[state]}
      label={quoteStateLabels[state]}
      sx={{ bgcolor: 'background.paper' }}
    />
  );
}
