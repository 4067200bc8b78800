import { VictoryAxis, VictoryChart, VictoryLine } from 'victory';
import type { DensityPoint } from '../utils/density-curve';
import { CHART_HEIGHT, CHART_PADDING, CHART_WIDTH, axisStyle } from './chart-style';

export type DensityQuantity = 'density' | 'plasmaFrequency';

export interface DensitySeries {
  label: string;
  color: string;
  points: DensityPoint[];
}

/** Densities are drawn in units of 10¹¹ m⁻³ so tick labels stay short. */
const DENSITY_UNIT_PER_M3 = 1e11;

const X_LABEL: Record<DensityQuantity, string> = {
  density: 'Electron density N (10¹¹ m⁻³)',
  plasmaFrequency: 'Plasma frequency fp (MHz)',
};

/** N(h) or f_p(h): the quantity horizontal, height (km) vertical, as profiles are read. */
export function DensityChart({
  series,
  quantity = 'density',
  title,
}: {
  series: DensitySeries[];
  quantity?: DensityQuantity;
  title: string;
}) {
  const xOf = (p: DensityPoint) =>
    quantity === 'density' ? p.electronDensityPerM3 / DENSITY_UNIT_PER_M3 : p.plasmaFrequencyMHz;
  const heights = series.flatMap((s) => s.points.map((p) => p.heightKm));
  const xs = series.flatMap((s) => s.points.map(xOf));
  const hasData = heights.length > 1;
  const yMax = hasData ? Math.ceil(Math.max(...heights) / 50) * 50 : 500;
  const yMin = hasData ? Math.max(0, Math.floor(Math.min(...heights) / 50) * 50) : 0;
  const xMax = hasData ? Math.max(...xs) * 1.05 || 1 : 1;

  return (
    <VictoryChart
      width={CHART_WIDTH}
      height={CHART_HEIGHT}
      padding={CHART_PADDING}
      domain={{ x: [0, xMax], y: [yMin, yMax] }}
      title={title}
      desc={`${X_LABEL[quantity]} horizontal, height in km vertical; ${series.length} curve(s).`}
    >
      <VictoryAxis label={X_LABEL[quantity]} style={axisStyle} />
      <VictoryAxis dependentAxis label="Height (km)" style={axisStyle} />
      {series.map((s) => (
        <VictoryLine
          key={s.label}
          data={s.points.map((p) => ({ x: xOf(p), y: p.heightKm }))}
          sortKey="y"
          style={{ data: { stroke: s.color, strokeWidth: 2 } }}
        />
      ))}
    </VictoryChart>
  );
}
