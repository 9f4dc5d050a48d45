import AppBar from '@mui/material/AppBar';
import Box from '@mui/material/Box';
import Container from '@mui/material/Container';
import Toolbar from '@mui/material/Toolbar';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';
import { Brand } from './brand';
import { NavigationProgress } from './navigation-progress';
import { MAIN_CONTENT_ID, SkipLink } from './skip-link';
import { useFocusMainOnNavigate } from './use-focus-main-on-navigate';

interface Props {
  /** The app bar's right side: a sign-in link, or the signed-in user's home link and menu. */
  actions?: ReactNode;
  children: ReactNode;
}

/** Pages anyone may open: home, the planner, sign in and the password pages. */
export function PublicLayout({ actions, children }: Props) {
  const mainRef = useFocusMainOnNavigate<HTMLElement>();
  return (
    <Box sx={{ minHeight: '100dvh', display: 'flex', flexDirection: 'column' }}>
      <SkipLink />
      <AppBar position="sticky">
        <Toolbar sx={{ gap: 1 }}>
          <Brand />
          <Box sx={{ flexGrow: 1 }} />
          {actions}
        </Toolbar>
        <NavigationProgress />
      </AppBar>
      <Box
        component="main"
        id={MAIN_CONTENT_ID}
        ref={mainRef}
        tabIndex={-1}
        sx={{ flex: 1, outline: 'none' }}
      >
        <Container maxWidth="md" sx={{ py: { xs: 2.5, md: 5 } }}>
          {children}
        </Container>
      </Box>
      <Box component="footer" sx={{ borderTop: 1, borderColor: 'divider', py: 3 }}>
        <Container maxWidth="md">
          <Typography variant="body2" color="text.secondary">
            A lift changes how a vehicle handles. Liftwright checks packages against the
            workshop&apos;s rules, but local modification limits, certification and licensed
            practice have the final word.
          </Typography>
        </Container>
      </Box>
    </Box>
  );
}
