import {
  createDarkTheme,
  createLightTheme,
  type BrandVariants,
  type Theme,
} from '@fluentui/react-components';

/**
 * Hopwise's own brand ramp: a deep teal (hue ≈ 198°) rising to an aurora green (hue ≈ 158°).
 * Shade 80 (the light theme's primary) keeps a contrast ratio ≥ 4.5:1 against white text
 * (WCAG 2.x, 1.4.3).
 */
export const hopwiseBrand: BrandVariants = {
  10: '#031117',
  20: '#051C24',
  30: '#072C36',
  40: '#0A3E48',
  50: '#0C505A',
  60: '#0E6067',
  70: '#117174',
  80: '#137F7D',
  90: '#16928B',
  100: '#1BB1A2',
  110: '#21CFB6',
  120: '#39DFC0',
  130: '#61E5C6',
  140: '#89EBD0',
  150: '#B5F2DF',
  160: '#E1FAF0',
};

const fontFamilyBase =
  "'Open Sans', -apple-system, BlinkMacSystemFont, 'Segoe UI', Roboto, 'Helvetica Neue', sans-serif";

export const hopwiseLightTheme: Theme = {
  ...createLightTheme(hopwiseBrand),
  fontFamilyBase,
};

const darkBase = createDarkTheme(hopwiseBrand);

// In the dark theme the brand foregrounds sit on a near-black surface, so they take lighter shades
// than the generated defaults to stay readable.
export const hopwiseDarkTheme: Theme = {
  ...darkBase,
  fontFamilyBase,
  colorBrandForeground1: hopwiseBrand[110],
  colorBrandForeground2: hopwiseBrand[120],
  colorBrandForegroundLink: hopwiseBrand[120],
  colorBrandForegroundLinkHover: hopwiseBrand[130],
  colorBrandForegroundLinkPressed: hopwiseBrand[110],
  colorCompoundBrandForeground1: hopwiseBrand[110],
  colorCompoundBrandStroke: hopwiseBrand[110],
};

export type ThemeMode = 'light' | 'dark';

export const themeFor = (mode: ThemeMode): Theme =>
  mode === 'dark' ? hopwiseDarkTheme : hopwiseLightTheme;
