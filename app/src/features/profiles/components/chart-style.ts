import { tokens } from '@fluentui/react-components';

/** Axis styling from the theme's tokens (CSS variables), so charts follow light and dark mode. */
export const axisStyle = {
  axis: { stroke: tokens.colorNeutralStroke1 },
  axisLabel: {
    fill: tokens.colorNeutralForeground2,
    fontSize: 13,
    padding: 36,
    fontFamily: 'inherit',
  },
  grid: { stroke: tokens.colorNeutralStroke2, strokeDasharray: '2,4' },
  ticks: { stroke: tokens.colorNeutralStroke1, size: 4 },
  tickLabels: { fill: tokens.colorNeutralForeground2, fontSize: 11, fontFamily: 'inherit' },
};

export const CHART_WIDTH = 560;
export const CHART_HEIGHT = 380;
export const CHART_PADDING = { top: 16, right: 24, bottom: 56, left: 64 };
