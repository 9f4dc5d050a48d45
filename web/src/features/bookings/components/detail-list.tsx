import Box from '@mui/material/Box';
import type { ReactNode } from 'react';

/** Label and value pairs as a description list, labels in one column on every width. */
export function DetailList({ children }: { children: ReactNode }) {
  return (
    <Box
      component="dl"
      sx={{
        m: 0,
        display: 'grid',
        gridTemplateColumns: 'max-content minmax(0, 1fr)',
        columnGap: 2,
        rowGap: 0.75,
      }}
    >
      {children}
    </Box>
  );
}

export function DetailRow({ label, value }: { label: string; value: ReactNode }) {
  return (
    <Box sx={{ display: 'contents' }}>
      <Box component="dt" sx={{ color: 'text.secondary' }}>
        {label}
      </Box>
      <Box component="dd" sx={{ m: 0 }}>
        {value}
      </Box>
    </Box>
  );
}
