import type { ProfileData } from '@hopwise/common';
import { useMemo } from 'react';
import { VictoryAxis, VictoryChart, VictoryContainer, VictoryLine } from 'victory';
import { profileCurve } from '../utils/profile-curve';
import { MODE_COLORS } from './chart-colors';
import { ChartFrame } from './chart-frame';
import { CHART_PADDING, axisStyle } from './chart-theme';

/** The profile as plasma frequency [MHz] (horizontal) against height [km] (vertical). */
export default function ProfileChart({
  profile,
  frequencyMHz,
}: {
  profile: ProfileData;
  frequencyMHz?: number;
}) {
  const points = useMemo(() => profileCurve(profile), [profile]);
  const topKm = points.length ? points[points.length - 1].heightKm : 600;
  const bottomKm = points.length ? points[0].heightKm : 0;
  return (
    <ChartFrame
      id="profile"
      title="Electron-density profile"
      note={
        <>
          Plasma frequency f<sub>p</sub> = 8.98·√N Hz against height: a wave at vertical incidence
          turns where f = f<sub>p</sub>; oblique waves reach higher frequencies (secant law).
          {frequencyMHz ? ` The dashed line marks ${frequencyMHz} MHz.` : ''}
        </>
      }
    >
      <VictoryChart
        width={640}
        height={300}
        padding={CHART_PADDING}
        containerComponent={
          <VictoryContainer
            title="Electron-density profile"
            desc="Plasma frequency in megahertz against height in kilometres."
          />
        }
      >
        <VictoryAxis label="Plasma frequency (MHz)" style={axisStyle} />
        <VictoryAxis dependentAxis label="Height (km)" style={axisStyle} />
        <VictoryLine
          data={points.map((p) => ({ x: p.plasmaFrequencyMHz, y: p.heightKm }))}
          sortKey="y"
          style={{ data: { stroke: MODE_COLORS[0], strokeWidth: 2.2 } }}
        />
        {frequencyMHz !== undefined && (
          <VictoryLine
            data={[
              { x: frequencyMHz, y: bottomKm },
              { x: frequencyMHz, y: topKm },
            ]}
            sortKey="y"
            style={{ data: { stroke: MODE_COLORS[1], strokeWidth: 1.2, strokeDasharray: '4 4' } }}
          />
        )}
      </VictoryChart>
    </ChartFrame>
  );
}
