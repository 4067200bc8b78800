import { Radio, RadioGroup } from '@fluentui/react-components';
import type { DensityQuantity } from './density-chart';

/** Chooses what the profile chart shows horizontally. */
export function QuantitySwitch({
  value,
  onChange,
}: {
  value: DensityQuantity;
  onChange: (value: DensityQuantity) => void;
}) {
  return (
    <RadioGroup
      layout="horizontal"
      aria-label="Profile chart quantity"
      value={value}
      onChange={(_, data) => onChange(data.value as DensityQuantity)}
    >
      <Radio value="density" label="Electron density" />
      <Radio value="plasmaFrequency" label="Plasma frequency" />
    </RadioGroup>
  );
}
