import Box from '@mui/material/Box';
import { tokens } from '@/theme/theme';

export const MAIN_CONTENT_ID = 'main-content';

/** The first focusable thing on every page: jumps past the app bar and navigation. */
export function SkipLink() {
  return (
    <Box
      component="a"
      href={`#${MAIN_CONTENT_ID}`}
      sx={{
        position: 'absolute',
        left: 8,
        top: -48,
        zIndex: (theme) => theme.zIndex.tooltip + 1,
        px: 2,
        py: 1,
        borderRadius: 1,
        bgcolor: 'background.paper',
        color: tokens.eucalyptusDeep,
        fontWeight: 500,
        '&:focus': { top: 8 },
      }}
    >
      Skip to main content
    </Box>
  );
}
