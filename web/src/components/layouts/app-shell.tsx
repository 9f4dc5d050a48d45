import AppBar from '@mui/material/AppBar';
import BottomNavigation from '@mui/material/BottomNavigation';
import BottomNavigationAction from '@mui/material/BottomNavigationAction';
import Box from '@mui/material/Box';
import Container from '@mui/material/Container';
import MoreHoriz from '@mui/icons-material/MoreHoriz';
import List from '@mui/material/List';
import ListItemButton from '@mui/material/ListItemButton';
import ListItemIcon from '@mui/material/ListItemIcon';
import ListItemText from '@mui/material/ListItemText';
import Menu from '@mui/material/Menu';
import MenuItem from '@mui/material/MenuItem';
import Paper from '@mui/material/Paper';
import Toolbar from '@mui/material/Toolbar';
import useMediaQuery from '@mui/material/useMediaQuery';
import { useTheme, type Breakpoint } from '@mui/material/styles';
import { useId, useState, type ReactNode } from 'react';
import { matchPath, NavLink, useLocation } from 'react-router';
import { Brand } from './brand';
import { NavigationProgress } from './navigation-progress';
import type { NavItem } from './nav-item';
import { MAIN_CONTENT_ID, SkipLink } from './skip-link';
import { useFocusMainOnNavigate } from './use-focus-main-on-navigate';

const SIDE_NAV_WIDTH = 232;
/** A phone's bottom bar holds at most this many destinations; more go behind "More". */
const BOTTOM_NAV_MAX_ITEMS = 5;
const MORE_VALUE = '#more';
const BOTTOM_NAV_HEIGHT = 64;
/** The desktop toolbar (64px) and the ochre rule under it (3px). */
const APP_BAR_HEIGHT = 67;

export interface AppShellProps {
  navItems: readonly NavItem[];
  /** The account button (who is signed in, sign out), supplied by the app. */
  accountMenu: ReactNode;
  /** How wide the page content may grow. */
  contentWidth: Breakpoint | false;
  children: ReactNode;
}

function isActive(item: NavItem, pathname: string): boolean {
  return matchPath({ path: item.to, end: item.end ?? false }, pathname) !== null;
}

/** The item to highlight: the most specific one whose path matches. */
function activeItem(items: readonly NavItem[], pathname: string): string | false {
  const matching = items.filter((item) => isActive(item, pathname));
  matching.sort((a, b) => b.to.length - a.to.length);
  return matching[0]?.to ?? false;
}

function SideNav({ items }: { items: readonly NavItem[] }) {
  return (
    <Box
      component="nav"
      aria-label="Main"
      sx={{
        width: SIDE_NAV_WIDTH,
        flexShrink: 0,
        borderRight: 1,
        borderColor: 'divider',
        bgcolor: 'background.paper',
      }}
    >
      <List
        sx={{
          p: 1.5,
          display: 'grid',
          gap: 0.5,
          position: 'sticky',
          top: APP_BAR_HEIGHT,
          maxHeight: `calc(100dvh - ${APP_BAR_HEIGHT}px)`,
          overflowY: 'auto',
        }}
      >
        {items.map((item) => (
          <li key={item.to}>
            <ListItemButton component={NavLink} to={item.to} end={item.end}>
              <ListItemIcon sx={{ minWidth: 40 }}>{item.icon}</ListItemIcon>
              <ListItemText primary={item.label} />
            </ListItemButton>
          </li>
        ))}
      </List>
    </Box>
  );
}

function BottomNav({ items }: { items: readonly NavItem[] }) {
  const { pathname } = useLocation();
  const menuId = useId();
  const moreId = useId();
  const [menuAnchor, setMenuAnchor] = useState<HTMLElement | null>(null);
  // Five destinations fit a phone's width with their labels; past that the last ones share a
  // "More" menu (the side bar on wide screens always lists them all).
  const overflowing = items.length > BOTTOM_NAV_MAX_ITEMS;
  const shown = overflowing ? items.slice(0, BOTTOM_NAV_MAX_ITEMS - 1) : items;
  const more = overflowing ? items.slice(BOTTOM_NAV_MAX_ITEMS - 1) : [];
  const active = activeItem(items, pathname);
  const value = more.some((item) => item.to === active) ? MORE_VALUE : active;

  return (
    <Paper
      component="nav"
      aria-label="Main"
      elevation={0}
      sx={{
        position: 'fixed',
        left: 0,
        right: 0,
        bottom: 0,
        zIndex: (theme) => theme.zIndex.appBar,
        borderTop: 1,
        borderColor: 'divider',
        pb: 'env(safe-area-inset-bottom)',
      }}
    >
      <BottomNavigation
        showLabels
        value={value}
        // Five labelled destinations share a 360px-wide phone: tighter side padding keeps
        // "Front desk" on one line.
        sx={{
          height: BOTTOM_NAV_HEIGHT,
          '& .MuiBottomNavigationAction-root': { minWidth: 0, px: 0.5 },
          '& .MuiBottomNavigationAction-label': { whiteSpace: 'nowrap' },
        }}
      >
        {shown.map((item) => (
          <BottomNavigationAction
            key={item.to}
            component={NavLink}
            to={item.to}
            end={item.end}
            value={item.to}
            label={item.label}
            icon={item.icon}
          />
        ))}
        {overflowing && (
          <BottomNavigationAction
            id={moreId}
            value={MORE_VALUE}
            label="More"
            icon={<MoreHoriz />}
            aria-haspopup="menu"
            aria-controls={menuAnchor ? menuId : undefined}
            aria-expanded={menuAnchor ? true : undefined}
            onClick={(event) => setMenuAnchor(event.currentTarget)}
          />
        )}
      </BottomNavigation>
      <Menu
        anchorEl={menuAnchor}
        open={menuAnchor !== null}
        onClose={() => setMenuAnchor(null)}
        anchorOrigin={{ vertical: 'top', horizontal: 'right' }}
        transformOrigin={{ vertical: 'bottom', horizontal: 'right' }}
        slotProps={{ list: { id: menuId, 'aria-labelledby': moreId } }}
      >
        {more.map((item) => (
          <MenuItem
            key={item.to}
            component={NavLink}
            to={item.to}
            end={item.end}
            selected={item.to === active}
            onClick={() => setMenuAnchor(null)}
            sx={{ minHeight: 48, minWidth: 180 }}
          >
            <ListItemIcon>{item.icon}</ListItemIcon>
            <ListItemText primary={item.label} />
          </MenuItem>
        ))}
      </Menu>
    </Paper>
  );
}

/**
 * The frame of every signed-in area: app bar with the product name and account menu; the main
 * navigation as a side bar on wide screens and a bottom bar on phones (one or the other, so
 * there is always exactly one "Main" navigation landmark).
 */
export function AppShell({ navItems, accountMenu, contentWidth, children }: AppShellProps) {
  const theme = useTheme();
  const wide = useMediaQuery(theme.breakpoints.up('md'), { noSsr: true });
  const mainRef = useFocusMainOnNavigate<HTMLElement>();

  return (
    <Box sx={{ minHeight: '100dvh', display: 'flex', flexDirection: 'column' }}>
      <SkipLink />
      <AppBar position="sticky">
        <Toolbar sx={{ gap: 1 }}>
          <Brand />
          <Box sx={{ flexGrow: 1 }} />
          {accountMenu}
        </Toolbar>
        <NavigationProgress />
      </AppBar>
      <Box sx={{ display: 'flex', flex: 1 }}>
        {wide && <SideNav items={navItems} />}
        <Box
          component="main"
          id={MAIN_CONTENT_ID}
          ref={mainRef}
          tabIndex={-1}
          sx={{
            flex: 1,
            minWidth: 0,
            outline: 'none',
            pb: wide ? 4 : `calc(${BOTTOM_NAV_HEIGHT + 24}px + env(safe-area-inset-bottom))`,
          }}
        >
          <Container maxWidth={contentWidth} sx={{ py: { xs: 2.5, md: 4 } }}>
            {children}
          </Container>
        </Box>
      </Box>
      {!wide && <BottomNav items={navItems} />}
    </Box>
  );
}
