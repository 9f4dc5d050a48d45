import Box from '@mui/material/Box';
import { Link as RouterLink } from 'react-router';
import { paths } from '@/config/paths';
import { tokens } from '@/theme/theme';

/** The product name in the app bar; a link to the public home page. */
export function Brand() {
  return (
    <Box
      component={RouterLink}
      to={paths.home.getHref()}
      sx={{
        display: 'inline-flex',
        alignItems: 'center',
        gap: 1,
        color: 'inherit',
        textDecoration: 'none',
        fontSize: '1.2rem',
        fontWeight: 700,
        letterSpacing: '0.01em',
        borderRadius: 1,
        py: 0.5,
      }}
    >
      <Box component="svg" viewBox="0 0 24 24" aria-hidden sx={{ width: 26, height: 26 }}>
        <circle cx="12" cy="14" r="7" fill="none" stroke={tokens.ochreStripe} strokeWidth="2.6" />
        <circle cx="12" cy="14" r="2.2" fill={tokens.ochreStripe} />
        <path d="M7.5 5.5 12 1.5l4.5 4z" fill="currentColor" />
      </Box>
      Liftwright
    </Box>
  );
}
