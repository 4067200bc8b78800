import { VictoryAxis, VictoryChart, VictoryContainer, VictoryLine, VictoryScatter } from 'victory';
import type { SweepPoint } from '../hooks/use-group-delay-sweep';
import { colorFor, curveName, dashFor } from './chart-colors';
import { ChartFrame } from './chart-frame';
import { CHART_PADDING, axisStyle } from './chart-theme';

interface GroupDelayChartProps {
  points: SweepPoint[];
  /** The frequency the mode table shows, marked on the chart. */
  selectedMHz?: number;
}

/** Group delay [ms] of each mode against frequency [MHz], from 2 MHz to the highest MUF. */
export default function GroupDelayChart({ points }: GroupDelayChartProps) {
  const names: string[] = [];
  for (const point of points) {
    for (const mode of point.modes) {
      const name = curveName(mode);
      if (!names.includes(name)) names.push(name);
    }
  }
  names.sort((a, b) => a.localeCompare(b, undefined, { numeric: true }));
  // One value per curve and frequency (a kinked profile can give a label twice: keep the first);
  // null where the mode does not exist, which breaks the line there.
  const series = names.map((name) => ({
    name,
    data: points.map((point) => {
      const mode = point.modes.find((m) => curveName(m) === name);
      return { x: point.frequencyMHz, y: mode ? mode.groupDelayMs : null };
    }),
  }));

  return (
    <ChartFrame
      id="group-delay"
      title="Group delay against frequency"
      legend={names.map((name) => ({
        name,
        color: colorFor(names, name),
        dashed: dashFor(name) !== undefined,
      }))}
      note="Each curve is one mode; it ends where the mode's MUF is reached. Group delay = group path / c."
    >
      <VictoryChart
        width={640}
        height={300}
        padding={CHART_PADDING}
        domainPadding={{ y: 8 }}
        containerComponent={
          <VictoryContainer
            title="Group delay against frequency"
            desc="Group delay in milliseconds of each propagation mode against frequency in megahertz."
          />
        }
      >
        <VictoryAxis label="Frequency (MHz)" style={axisStyle} />
        <VictoryAxis dependentAxis label="Group delay (ms)" style={axisStyle} />
        {series.map((s) => (
          <VictoryLine
            key={s.name}
            data={s.data}
            style={{
              data: {
                stroke: colorFor(names, s.name),
                strokeWidth: 2,
                strokeDasharray: dashFor(s.name),
              },
            }}
          />
        ))}
        {series.map((s) => (
          <VictoryScatter
            key={`${s.name}-points`}
            data={s.data.filter((d) => d.y !== null)}
            size={1.8}
            style={{ data: { fill: colorFor(names, s.name) } }}
          />
        ))}
      </VictoryChart>
    </ChartFrame>
  );
}
