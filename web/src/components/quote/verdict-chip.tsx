import Chip, { type ChipProps } from '@mui/material/Chip';
import type { FitVerdict } from '@/types/api';
import { verdictLabels, verdictSeverity } from './fit-labels';

/** A fit verdict as a small chip (colour and words, never colour alone). */
export function VerdictChip({
  verdict,
  size = 'small',
}: {
  verdict: FitVerdict;
  size?: ChipProps['size'];
}) {
  return (
    <Chip
      size={size}
      variant="outlined"
      color={verdictSeverity[verdict]}
      label={verdictLabels[verdict]}
      sx={{ bgcolor: 'background.paper' }}
    />
  );
}
