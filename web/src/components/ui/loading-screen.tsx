import Box from '@mui/material/Box';
import CircularProgress from '@mui/material/CircularProgress';

/** A centred spinner with a spoken label, for whole pages that are still loading. */
export function LoadingScreen({ label = 'Loading' }: { label?: string }) {
  return (
    <Box
      role="status"
      sx={{ display: 'grid', placeItems: 'center', minHeight: '50vh', p: 4 }}
      aria-live="polite"
    >
      <CircularProgress aria-label={label} />
    </Box>
  );
}
