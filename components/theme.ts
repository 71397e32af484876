/** Baywalk's palette and type scale. Use these instead of literal colours. */
export const colors = {
  ink: '#1E2A32',
  inkMuted: '#4E5D68',
  paper: '#F6F4EF',
  surface: '#FFFFFF',
  line: '#D8D2C4',
  accent: '#0E7C74',
  accentDark: '#0A5E58',
  accentSoft: '#DCEFEC',
  caution: '#B45309',
  cautionSoft: '#FDF1E4',
  danger: '#A3282E',
  dangerSoft: '#FBE9EA',
  ok: '#2F6F3E',
  okSoft: '#E5F2E7',
  onAccent: '#FFFFFF',
} as const;

export const fonts = {
  regular: 'NunitoSans_400Regular',
  semibold: 'NunitoSans_600SemiBold',
  bold: 'NunitoSans_700Bold',
} as const;

/** Type scale: readable outdoors on a phone held at arm's length. */
export const type = {
  title: { fontFamily: fonts.bold, fontSize: 28, lineHeight: 34 },
  heading: { fontFamily: fonts.bold, fontSize: 21, lineHeight: 28 },
  subheading: { fontFamily: fonts.semibold, fontSize: 18, lineHeight: 24 },
  body: { fontFamily: fonts.regular, fontSize: 17, lineHeight: 25 },
  label: { fontFamily: fonts.semibold, fontSize: 15, lineHeight: 20 },
  small: { fontFamily: fonts.regular, fontSize: 14, lineHeight: 19 },
} as const;

export const space = { xs: 4, sm: 8, md: 12, lg: 16, xl: 24, xxl: 32 } as const;
export const radius = { sm: 6, md: 10, lg: 16 } as const;

/** Minimum touch target, in px. */
export const touchTarget = 48;
/** Content width on wide screens; phones use the full width. */
export const maxContentWidth = 960;
/** Width from which layouts switch to two columns or tables. */
export const wideBreakpoint = 768;
