import { Platform } from 'react-native';
import { faces } from './fonts.json';

/**
 * The one theme module: colours for light and dark, spacing, radii and type.
 * Nothing else in the app picks a colour.
 */
export const Colors = {
  light: {
    background: '#f6f7f9',
    surface: '#ffffff',
    surfaceMuted: '#eef1f5',
    border: '#d5dae1',
    text: '#17202a',
    textMuted: '#55606e',
    primary: '#1f4e79',
    primaryText: '#ffffff',
    focus: '#2b7bd6',
    pass: '#1e7b34',
    passSurface: '#e3f4e7',
    marginal: '#8a5a00',
    marginalSurface: '#fff1d1',
    fail: '#b3261e',
    failSurface: '#fbe3e1',
    caution: '#7a4b00',
    cautionSurface: '#fff4dc',
    cautionBorder: '#e0a526',
  },
  dark: {
    background: '#10151b',
    surface: '#18202a',
    surfaceMuted: '#212b37',
    border: '#334050',
    text: '#e8edf3',
    textMuted: '#a4afbd',
    primary: '#7db3e8',
    primaryText: '#0b1420',
    focus: '#9cc8f5',
    pass: '#6fd08a',
    passSurface: '#173323',
    marginal: '#f2c14e',
    marginalSurface: '#3a2d0c',
    fail: '#ff8a80',
    failSurface: '#3d1715',
    caution: '#f2c14e',
    cautionSurface: '#33290f',
    cautionBorder: '#a87a12',
  },
} as const;

export type ThemeColors = { [K in keyof typeof Colors.light]: string };
export type ThemeColor = keyof ThemeColors;

export const Spacing = { xs: 4, sm: 8, md: 12, lg: 16, xl: 24, xxl: 32 } as const;
export const Radius = { sm: 4, md: 8, lg: 12 } as const;

/**
 * A weight's font family. On the web: the build's cut-down font first, the full font for
 * characters it lacks, and a system sans-serif until they have loaded (no flash of serif text).
 */
function family(weight: number): string {
  const face = faces.find((f) => f.weight === weight)!;
  return Platform.OS === 'web'
    ? `"${face.webFamily}", ${face.family}, system-ui, -apple-system, "Segoe UI", Roboto, sans-serif`
    : face.family;
}

export const Fonts = {
  regular: family(400),
  semibold: family(600),
  // Two weights are bundled; headings use the semibold.
  bold: family(600),
} as const;

export const Type = {
  title: { fontFamily: Fonts.bold, fontSize: 26, lineHeight: 32 },
  heading: { fontFamily: Fonts.semibold, fontSize: 19, lineHeight: 25 },
  body: { fontFamily: Fonts.regular, fontSize: 16, lineHeight: 22 },
  label: { fontFamily: Fonts.semibold, fontSize: 14, lineHeight: 18 },
  small: { fontFamily: Fonts.regular, fontSize: 13, lineHeight: 18 },
  value: { fontFamily: Fonts.bold, fontSize: 20, lineHeight: 26 },
} as const;

/** Width from which screens use two columns. */
export const WIDE_BREAKPOINT = 900;
