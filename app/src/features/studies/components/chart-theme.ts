import { tokens } from '@fluentui/react-components';

/** Axis styles in the app's theme colours (CSS variables work in Victory's inline SVG styles). */
export const axisStyle = {
  axis: { stroke: tokens.colorNeutralStroke1 },
  axisLabel: { fill: tokens.colorNeutralForeground2, fontSize: 11, padding: 32 },
  grid: { stroke: tokens.colorNeutralStroke2, strokeDasharray: '2 4' },
  ticks: { stroke: tokens.colorNeutralStroke1, size: 4 },
  tickLabels: { fill: tokens.colorNeutralForeground2, fontSize: 10, padding: 3 },
};

export const CHART_PADDING = { top: 12, right: 20, bottom: 46, left: 58 };
