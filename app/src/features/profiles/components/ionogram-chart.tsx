import { VictoryAxis, VictoryChart, VictoryLine, VictoryScatter } from 'victory';
import type { ChartPoint } from '../utils/ionogram-points';
import { CHART_HEIGHT, CHART_PADDING, CHART_WIDTH, axisStyle } from './chart-style';

export interface IonogramSeries {
  label: string;
  color: string;
  points: ChartPoint[];
  /** 'line' for a synthetic ionogram, 'dots' for a measured trace. */
  mark?: 'line' | 'dots';
}

/**
 * Virtual height h'(f) against frequency: frequency (MHz) horizontal, virtual height (km) vertical,
 * as ionograms are read. Gaps (y = null) are frequencies with no echo or off-scale echoes.
 */
export function IonogramChart({
  series,
  ceilingKm,
  title,
}: {
  series: IonogramSeries[];
  ceilingKm: number;
  title: string;
}) {
  const xs = series.flatMap((s) => s.points.map((p) => p.x));
  const xMax = xs.length > 0 ? Math.ceil(Math.max(...xs)) : 10;
  const xMin = xs.length > 0 ? Math.max(0, Math.floor(Math.min(...xs))) : 0;
  return (
    <VictoryChart
      width={CHART_WIDTH}
      height={CHART_HEIGHT}
      padding={CHART_PADDING}
      domain={{ x: [xMin, xMax], y: [0, ceilingKm] }}
      title={title}
      desc={`Frequency in MHz horizontal, virtual height in km vertical; ${series.length} series.`}
    >
      <VictoryAxis label="Frequency (MHz)" style={axisStyle} />
      <VictoryAxis dependentAxis label="Virtual height h′ (km)" style={axisStyle} />
      {series.map((s) =>
        s.mark === 'dots' ? (
          <VictoryScatter
            key={s.label}
            data={s.points.filter((p) => p.y !== null)}
            size={2.5}
            style={{ data: { fill: s.color } }}
          />
        ) : (
          <VictoryLine
            key={s.label}
            data={s.points}
            style={{ data: { stroke: s.color, strokeWidth: 2 } }}
          />
        ),
      )}
    </VictoryChart>
  );
}
