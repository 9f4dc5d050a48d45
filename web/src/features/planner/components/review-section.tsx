import Box from '@mui/material/Box';
import Typography from '@mui/material/Typography';
import { useId, type ReactNode } from 'react';
import { isApiError } from '@/lib/api-client';

/** An API error in words: its message, then every field message. */
export function errorText(error: unknown): string {
  if (!isApiError(error)) return 'Something went wrong. Please try again.';
  const details = Object.values(error.fieldErrors).flat();
  return details.length > 0 ? details.join(' ') : error.message;
}

/** One titled part of the Review step (the vehicle, the lines, the fit report, the price). */
export function ReviewSection({ title, children }: { title: string; children: ReactNode }) {
  const id = useId();
  return (
    <Box component="section" aria-labelledby={id}>
      <Typography id={id} variant="h2" sx={{ mb: 1.5 }}>
        {title}
      </Typography>
      {children}
    </Box>
  );
}
