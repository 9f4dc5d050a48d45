import Chip from '@mui/material/Chip';
import type { BookingState } from '@/types/api';
import { bookingStateLabels } from '../utils/booking-text';

const stateColours: Record<
  BookingState,
  'default' | 'primary' | 'success' | 'warning' | 'error' | 'info'
> = {
  held: 'warning',
  requested: 'info',
  confirmed: 'success',
  'in-progress': 'primary',
  completed: 'success',
  cancelled: 'default',
  expired: 'default',
};

/** A booking's state in words and colour. */
export function BookingStateChip({ state }: { state: BookingState }) {
  return (
    <Chip
      size="small"
      variant="outlined"
      color={stateColours[state]}
      label={bookingStateLabels[state]}
      sx={{ bgcolor: 'background.paper' }}
    />
  );
}
