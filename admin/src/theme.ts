import type { RaThemeOptions } from 'react-admin';

/**
 * Pourgate's look: a deep ink bar, warm paper background, petrol as the working colour and
 * amber/teal for the two parts of the logo mark. Tables are dense because admins scan long lists.
 */
export const palette = {
  ink: '#14262b',
  inkSoft: '#22393f',
  paper: '#f4f3ef',
  cream: '#f1e6cc',
  partA: '#e8a33d',
  partB: '#4fb3a9',
  petrol: '#0d5f6b',
  petrolDark: '#08434c',
  copper: '#a4521c',
  line: '#dedad0',
  text: '#1b2426',
  textSoft: '#515c5d',
} as const;

export const monoFont = 'ui-monospace, "SFMono-Regular", "DejaVu Sans Mono", Menlo, Consolas, monospace';

export const theme: RaThemeOptions = {
  palette: {
    mode: 'light',
    primary: { main: palette.petrol, dark: palette.petrolDark, light: '#3f8c97', contrastText: '#ffffff' },
    secondary: { main: palette.copper, contrastText: '#ffffff' },
    success: { main: '#2f7d4f' },
    warning: { main: '#9a6200', light: '#fdf3dc' },
    error: { main: '#b3261e' },
    info: { main: '#1d6784' },
    background: { default: palette.paper, paper: '#ffffff' },
    text: { primary: palette.text, secondary: palette.textSoft },
    divider: palette.line,
  },
  shape: { borderRadius: 6 },
  typography: {
    fontFamily: '"Fira Sans", "Helvetica Neue", Arial, sans-serif',
    fontSize: 14,
    h1: { fontSize: '1.9rem', fontWeight: 500, letterSpacing: '-0.01em' },
    h2: { fontSize: '1.55rem', fontWeight: 500 },
    h3: { fontSize: '1.3rem', fontWeight: 500 },
    h4: { fontSize: '1.2rem', fontWeight: 500 },
    h5: { fontSize: '1.08rem', fontWeight: 500 },
    h6: { fontSize: '1rem', fontWeight: 500 },
    button: { textTransform: 'none', fontWeight: 500, letterSpacing: 0 },
    overline: { fontWeight: 500, letterSpacing: '0.09em', lineHeight: 1.6 },
  },
  sidebar: { width: 232, closedWidth: 56 },
  components: {
    MuiAppBar: {
      defaultProps: { elevation: 0 },
      styleOverrides: {
        root: { backgroundColor: palette.ink, color: '#f7f5ef', borderBottom: `3px solid ${palette.partA}` },
      },
    },
    MuiPaper: {
      defaultProps: { elevation: 0 },
      styleOverrides: { outlined: { borderColor: palette.line } },
    },
    MuiCard: {
      defaultProps: { variant: 'outlined' },
    },
    MuiButton: {
      defaultProps: { disableElevation: true },
      styleOverrides: { root: { borderRadius: 6 } },
    },
    MuiChip: {
      styleOverrides: { root: { fontWeight: 500 }, sizeSmall: { height: 22, fontSize: '0.75rem' } },
    },
    MuiTableCell: {
      styleOverrides: {
        root: { borderBottomColor: palette.line },
        sizeSmall: { padding: '5px 12px' },
        head: {
          fontSize: '0.72rem',
          fontWeight: 600,
          textTransform: 'uppercase',
          letterSpacing: '0.06em',
          color: palette.textSoft,
          backgroundColor: '#faf9f5',
          whiteSpace: 'nowrap',
        },
      },
    },
    MuiTableRow: {
      styleOverrides: {
        root: { '&.MuiTableRow-hover:hover': { backgroundColor: '#f1f6f6' } },
      },
    },
    MuiFilledInput: {
      defaultProps: { disableUnderline: false },
    },
    MuiTextField: { defaultProps: { variant: 'outlined', size: 'small' } },
    MuiFormControl: { defaultProps: { variant: 'outlined', size: 'small' } },
    MuiDialogTitle: { styleOverrides: { root: { fontSize: '1.15rem', fontWeight: 500 } } },
    MuiTooltip: { styleOverrides: { tooltip: { backgroundColor: palette.inkSoft, fontSize: '0.78rem' } } },
    MuiAlert: { styleOverrides: { root: { alignItems: 'flex-start' } } },
    MuiMenuItem: {
      styleOverrides: {
        root: {
          '&.RaMenuItemLink-active': {
            backgroundColor: '#e3efef',
            color: palette.petrolDark,
            boxShadow: `inset 3px 0 0 ${palette.petrol}`,
            fontWeight: 500,
            '& .MuiListItemIcon-root': { color: palette.petrol },
          },
        },
      },
    },
    RaLayout: {
      styleOverrides: {
        // react-admin sizes the frame to fit its widest content: a wide table then widened the whole
        // page past a phone's screen (clipped at the right); wide tables scroll in their own region
        root: {
          minWidth: 0,
          '& .RaLayout-contentWithSidebar, & .RaLayout-content': { minWidth: 0 },
          '& .RaLayout-content': { padding: '16px 24px 32px', backgroundColor: palette.paper, '@media (max-width: 599.95px)': { padding: '12px 12px 24px' } },
        },
      },
    },
    RaSidebar: {
      styleOverrides: {
        root: { '& .RaSidebar-fixed': { backgroundColor: '#fbfaf7', borderRight: `1px solid ${palette.line}` } },
      },
    },
    RaList: {
      styleOverrides: { root: { '& .RaList-content': { border: `1px solid ${palette.line}`, borderRadius: 6, overflow: 'hidden' } } },
    },
  },
};
