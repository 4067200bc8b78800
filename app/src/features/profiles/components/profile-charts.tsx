import {
  MessageBar,
  MessageBarBody,
  Spinner,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { buildProfile, type ProfileInput } from '@hopwise/common';
import { useMemo, useState } from 'react';
import { useVertical } from '../api/compute-vertical';
import type { ProfileBody } from '../api/types';
import { sampleDensityCurve } from '../utils/density-curve';
import { frequencyGridMHz, sweepTopMHz } from '../utils/frequency-grid';
import { ionogramCeilingKm, ionogramPoints } from '../utils/ionogram-points';
import { ChartFrame } from './chart-frame';
import { ChartLegend } from './chart-legend';
import { seriesColor } from './chart-colors';
import { DensityChart, type DensityQuantity } from './density-chart';
import { IonogramChart } from './ionogram-chart';
import { QuantitySwitch } from './quantity-switch';

const useStyles = makeStyles({
  grid: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(min(420px, 100%), 1fr))',
    gap: tokens.spacingHorizontalXL,
    alignItems: 'start',
  },
});

/**
 * A profile's N(h) (sampled in the browser from the physics core) beside its synthetic ionogram
 * (from `POST /api/compute/vertical`). `request` is what the compute route receives — `{ id }`
 * for a stored profile, or the body itself while building.
 */
export function ProfileCharts({
  body,
  request,
  label,
}: {
  body: ProfileBody;
  request: ProfileInput;
  label: string;
}) {
  const styles = useStyles();
  const [quantity, setQuantity] = useState<DensityQuantity>('density');
  const built = useMemo(() => {
    try {
      return buildProfile(body);
    } catch {
      return null;
    }
  }, [body]);
  const curve = useMemo(() => (built ? sampleDensityCurve(built) : []), [built]);
  const frequencies = useMemo(
    () => (built ? frequencyGridMHz(1, sweepTopMHz(built.maxPlasmaFrequencyMHz)) : []),
    [built],
  );
  const vertical = useVertical(built ? request : null, frequencies);
  const echoes = vertical.data?.echoes ?? [];
  const ceilingKm = ionogramCeilingKm(
    echoes.filter((e) => e.reflected).map((e) => e.virtualHeightKm ?? NaN),
  );

  if (!built) {
    return (
      <MessageBar intent="warning">
        <MessageBarBody>
          This profile cannot be drawn: its layers or samples are not valid.
        </MessageBarBody>
      </MessageBar>
    );
  }

  return (
    <div className={styles.grid}>
      <ChartFrame
        title="Electron density with height"
        legend={<QuantitySwitch value={quantity} onChange={setQuantity} />}
        caption="Sampled from the profile in your browser. fp = 8.98·√N Hz (Davies 1990)."
      >
        <DensityChart
          title={`${label}: profile`}
          quantity={quantity}
          series={[{ label, color: seriesColor(0), points: curve }]}
        />
      </ChartFrame>
      <ChartFrame
        title="Synthetic ionogram"
        overlay={vertical.isFetching ? <Spinner size="small" label="Computing…" /> : undefined}
        legend={<ChartLegend label="Ionogram key" entries={[{ label, color: seriesColor(0) }]} />}
        caption="Virtual height of the vertical-incidence echo at each frequency (cold plasma, no geomagnetic field, ordinary ray only). A computed estimate, not a measured ionogram."
      >
        {vertical.isError ? (
          <MessageBar intent="error" role="alert">
            <MessageBarBody>
              Could not compute the ionogram: {vertical.error.message}
            </MessageBarBody>
          </MessageBar>
        ) : (
          <IonogramChart
            title={`${label}: synthetic ionogram`}
            ceilingKm={ceilingKm}
            series={[{ label, color: seriesColor(0), points: ionogramPoints(echoes, ceilingKm) }]}
          />
        )}
      </ChartFrame>
    </div>
  );
}
