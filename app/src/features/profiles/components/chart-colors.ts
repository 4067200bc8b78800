/**
 * Hopwise's own series colours for profile charts: teal (the brand), ember, indigo and ochre,
 * chosen to stay apart for the common colour-vision deficiencies and readable on light and dark
 * backgrounds. Measured traces are drawn as dots in the foreground colour.
 */
export const SERIES_COLORS = ['#15857F', '#D0583A', '#5B5FD6', '#B58A00'] as const;

export const seriesColor = (index: number): string => SERIES_COLORS[index % SERIES_COLORS.length];

export const MEASURED_COLOR = 'var(--colorNeutralForeground1)';
