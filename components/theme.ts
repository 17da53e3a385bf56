/**
 * Frostgrade design tokens: one place for colour, type, spacing and radii.
 *
 * The palette is "frost slate": pale, cold surfaces and a night-slate
 * navigation chrome, with a single warm "ember" accent that stands for the
 * hot side of a leg. Status never relies on colour alone: every status
 * colour is paired with a glyph and a word where it is used.
 */

export const palette = {
  frost50: '#F7FAFB',
  frost100: '#EDF2F5',
  frost200: '#DFE7EC',
  frost300: '#C6D3DB',
  slate500: '#5E7180',
  slate600: '#465866',
  slate700: '#2E3F4C',
  slate800: '#1C2C37',
  slate900: '#122029',
  night700: '#1E3644',
  night800: '#172A36',
  ice300: '#9CC7DD',
  ice400: '#6FA9C8',
  glacier600: '#1D5E7E',
  glacier700: '#174B65',
  glacier100: '#D5E7F0',
  ember500: '#D8642C',
  ember600: '#B9501C',
  ember100: '#F8E3D6',
  pine600: '#22704E',
  pine100: '#D7EDE2',
  garnet600: '#A52842',
  garnet100: '#F6DDE3',
  white: '#FFFFFF',
} as const;

export const colors = {
  background: palette.frost100,
  surface: palette.frost50,
  surfaceSunken: palette.frost200,
  /** Inside text inputs: a touch brighter than cards. */
  field: palette.white,
  border: palette.frost300,
  text: palette.slate900,
  textMuted: palette.slate600,
  textFaint: palette.slate500,
  primary: palette.glacier600,
  primaryPressed: palette.glacier700,
  primarySoft: palette.glacier100,
  onPrimary: palette.white,
  heat: palette.ember600,
  heatBright: palette.ember500,
  heatSoft: palette.ember100,
  cold: palette.ice400,
  coldBright: palette.ice300,
  ok: palette.pine600,
  okSoft: palette.pine100,
  danger: palette.garnet600,
  dangerSoft: palette.garnet100,
  chrome: palette.slate800,
  chromeRaised: palette.night700,
  chromeText: palette.frost300,
  chromeTextActive: palette.white,
  chromeBorder: palette.night800,
} as const;

/**
 * How chart series are told apart: colour, line style and marker together,
 * so a legend still reads in grey scale. Ordered cold to hot: series are
 * assigned in ascending temperature.
 */
export const chartMarks = [
  { color: palette.glacier600, dash: 'solid', marker: 'circle' },
  { color: palette.slate600, dash: 'dashed', marker: 'square' },
  { color: palette.ember600, dash: 'dotted', marker: 'star' },
  { color: palette.pine600, dash: 'dashdot', marker: 'circle' },
] as const;

/** End points of the cold-to-hot gradient used by the graded-strip motif. */
export const gradeStops = { cold: palette.ice300, hot: palette.ember500 } as const;

export const spacing = {
  xxs: 2,
  xs: 4,
  sm: 8,
  md: 12,
  lg: 16,
  xl: 24,
  xxl: 32,
  xxxl: 48,
} as const;

export const radii = {
  sm: 4,
  md: 8,
  lg: 14,
  pill: 999,
} as const;

/** Font family names as registered by `useFonts` in the root layout. */
export const fonts = {
  sans: 'IBMPlexSans_400Regular',
  sansMedium: 'IBMPlexSans_500Medium',
  sansBold: 'IBMPlexSans_600SemiBold',
  mono: 'IBMPlexMono_400Regular',
  monoMedium: 'IBMPlexMono_500Medium',
} as const;

export const type = {
  caption: { fontFamily: fonts.sans, fontSize: 12, lineHeight: 16 },
  label: { fontFamily: fonts.sansMedium, fontSize: 13, lineHeight: 18 },
  body: { fontFamily: fonts.sans, fontSize: 15, lineHeight: 22 },
  bodyStrong: { fontFamily: fonts.sansMedium, fontSize: 15, lineHeight: 22 },
  heading: { fontFamily: fonts.sansBold, fontSize: 18, lineHeight: 24 },
  title: { fontFamily: fonts.sansBold, fontSize: 26, lineHeight: 32 },
  mono: { fontFamily: fonts.mono, fontSize: 13, lineHeight: 18 },
  monoStrong: { fontFamily: fonts.monoMedium, fontSize: 12, lineHeight: 16, letterSpacing: 0.6 },
} as const;

export const layout = {
  /** Window width (px) from which the side rail replaces the bottom tabs. */
  wideMinWidth: 768,
  /** Content width (px) from which family cards sit two per row. */
  twoColumnMinWidth: 880,
  railWidth: 216,
  contentMaxWidth: 1040,
  tabBarHeight: 60,
  hairline: 1,
} as const;
