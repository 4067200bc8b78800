import { VictoryAxis, VictoryChart, VictoryContainer, VictoryLine } from 'victory';
import type { ObliqueModeResult } from '@/types/links';
import { colorFor, curveName, dashFor } from './chart-colors';
import { ChartFrame } from './chart-frame';
import { CHART_PADDING, axisStyle } from './chart-theme';

/** Height [km] against ground range [km] along each mode's ray, all hops. */
export default function RayDiagramChart({
  modes,
  frequencyMHz,
}: {
  modes: ObliqueModeResult[];
  frequencyMHz: number;
}) {
  const withPaths = modes.filter((m) => m.rayPath && m.rayPath.length > 1);
  const names = [...new Set(withPaths.map(curveName))];
  return (
    <ChartFrame
      id="ray-diagram"
      title={`Ray paths at ${frequencyMHz} MHz`}
      legend={names.map((name) => ({
        name,
        color: colorFor(names, name),
        dashed: dashFor(name) !== undefined,
      }))}
      note="Height above the ground against distance along the ground. The vertical scale is exaggerated (a few hundred km of height against up to thousands of km of range), so rays look far steeper than they are."
    >
      <VictoryChart
        width={640}
        height={300}
        padding={CHART_PADDING}
        containerComponent={
          <VictoryContainer
            title={`Ray paths at ${frequencyMHz} MHz`}
            desc="Height in kilometres against ground range in kilometres for each propagation mode."
          />
        }
      >
        <VictoryAxis label="Ground range (km)" style={axisStyle} />
        <VictoryAxis dependentAxis label="Height (km)" style={axisStyle} />
        {withPaths.map((mode, i) => (
          <VictoryLine
            key={`${curveName(mode)}-${i}`}
            data={(mode.rayPath ?? []).map((p) => ({ x: p.groundRangeKm, y: p.heightKm }))}
            sortKey="x"
            style={{
              data: {
                stroke: colorFor(names, curveName(mode)),
                strokeWidth: 1.8,
                strokeDasharray: dashFor(curveName(mode)),
              },
            }}
          />
        ))}
      </VictoryChart>
    </ChartFrame>
  );
}
