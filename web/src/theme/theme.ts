import { alpha, createTheme } from '@mui/material/styles';

/**
 * Liftwright's own look: a deep eucalyptus-slate for structure, a warm ochre for emphasis and
 * focus, on a paper-toned background. Contrast ratios (WCAG 2.x) are noted beside each pairing.
 */
export const tokens = {
  eucalyptus: '#2e5a4f', // white text on it: 7.8:1
  eucalyptusDeep: '#1f3f37', // white text on it: 11.5:1
  eucalyptusMist: '#e3ece8', // eucalyptusDeep text on it: 9.6:1
  ochre: '#c98a2b', // dark text (#1d1a16) on it: 5.9:1
  ochreDeep: '#8a5a12', // on white: 5.9:1 (focus ring on light surfaces)
  ochreBright: '#f2c46d', // on eucalyptus: 4.8:1 (focus ring on the app bar)
  ochreStripe: '#e0a94a', // on eucalyptus: 3.7:1 (decorative rule under the app bar)
  paper: '#f5f3ee',
  ink: '#1d2623', // on paper: 14:1
  inkSoft: '#4e5b57', // on white: 7.1:1, on paper: 6.4:1
} as const;

const fontFamily = ['Roboto', '"Helvetica Neue"', 'Arial', 'sans-serif'].join(',');

export const theme = createTheme({
  palette: {
    mode: 'light',
    primary: {
      main: tokens.eucalyptus,
      dark: tokens.eucalyptusDeep,
      light: '#5e8a7e',
      contrastText: '#ffffff',
    },
    secondary: {
      main: tokens.ochre,
      dark: tokens.ochreDeep,
      light: tokens.ochreStripe,
      contrastText: '#1d1a16',
    },
    error: { main: '#b3261e' }, // white on it: 6.5:1
    warning: { main: '#8b5e00' }, // white on it: 5.7:1
    success: { main: '#2e6b3a' }, // white on it: 6.4:1
    info: { main: '#1f5c8a' }, // white on it: 7.1:1
    background: { default: tokens.paper, paper: '#ffffff' },
    text: { primary: tokens.ink, secondary: tokens.inkSoft },
    divider: 'rgba(29, 38, 35, 0.14)',
  },
  shape: { borderRadius: 10 },
  typography: {
    fontFamily,
    h1: { fontSize: '1.75rem', fontWeight: 500, lineHeight: 1.25, letterSpacing: '-0.01em' },
    h2: { fontSize: '1.3rem', fontWeight: 500, lineHeight: 1.3 },
    h3: { fontSize: '1.1rem', fontWeight: 500, lineHeight: 1.35 },
    h4: { fontSize: '1rem', fontWeight: 500 },
    h5: { fontSize: '1rem', fontWeight: 500 },
    h6: { fontSize: '1rem', fontWeight: 500 },
    subtitle1: { fontWeight: 500 },
    overline: { fontWeight: 500, letterSpacing: '0.12em' },
    button: { textTransform: 'none', fontWeight: 500, letterSpacing: '0.01em' },
  },
  components: {
    MuiCssBaseline: {
      styleOverrides: {
        body: { WebkitFontSmoothing: 'antialiased' },
        // One visible focus ring everywhere, in place of the ripple-only default.
        ':focus-visible': {
          outline: `3px solid ${tokens.ochreDeep}`,
          outlineOffset: 2,
        },
        // Text fields show focus with their own thick border.
        '.MuiInputBase-input:focus-visible': { outline: 'none' },
      },
    },
    MuiButtonBase: {
      styleOverrides: {
        // MUI's buttons reset the outline; every button-like control (switches included) gets
        // the same ring when focused from the keyboard.
        root: {
          '&.Mui-focusVisible': { outline: `3px solid ${tokens.ochreDeep}`, outlineOffset: 2 },
        },
      },
    },
    MuiButton: {
      defaultProps: { disableElevation: true },
      styleOverrides: {
        root: { borderRadius: 8, minHeight: 44, paddingInline: 18 },
        sizeSmall: { minHeight: 36 },
      },
    },
    MuiIconButton: {
      styleOverrides: { root: { minWidth: 44, minHeight: 44 } },
    },
    MuiAppBar: {
      defaultProps: { elevation: 0, color: 'primary' },
      styleOverrides: {
        root: {
          borderBottom: `3px solid ${tokens.ochreStripe}`,
          '& :focus-visible, & .MuiButtonBase-root.Mui-focusVisible': {
            outlineColor: tokens.ochreBright,
          },
        },
      },
    },
    MuiCard: {
      defaultProps: { variant: 'outlined' },
      styleOverrides: { root: { borderRadius: 14 } },
    },
    MuiTextField: { defaultProps: { fullWidth: true, margin: 'normal' } },
    MuiAlert: {
      styleOverrides: { root: { borderRadius: 10 } },
    },
    MuiTableCell: {
      styleOverrides: {
        head: { fontWeight: 500, color: tokens.inkSoft, whiteSpace: 'nowrap' },
      },
    },
    MuiMenuItem: {
      styleOverrides: { root: { '&.Mui-focusVisible': { outlineOffset: -3 } } },
    },
    MuiListItemButton: {
      styleOverrides: {
        root: {
          borderRadius: 8,
          '&.Mui-focusVisible': { outlineOffset: -3 },
          '&.active': {
            backgroundColor: tokens.eucalyptusMist,
            color: tokens.eucalyptusDeep,
            fontWeight: 500,
            boxShadow: `inset 4px 0 0 ${tokens.ochre}`,
          },
          '&.active .MuiListItemIcon-root': { color: tokens.eucalyptusDeep },
        },
      },
    },
    MuiBottomNavigationAction: {
      styleOverrides: {
        root: {
          color: tokens.inkSoft,
          '&.Mui-selected': { color: tokens.eucalyptusDeep },
          '&.Mui-focusVisible': { outlineOffset: -3 },
        },
      },
    },
    MuiChip: {
      styleOverrides: { root: { fontWeight: 500 } },
    },
    MuiLinearProgress: {
      styleOverrides: { root: { backgroundColor: alpha(tokens.ochre, 0.25) } },
    },
  },
});
