import {
  Field,
  Input,
  Select,
  Subtitle2,
  Switch,
  makeStyles,
  mergeClasses,
  tokens,
} from '@fluentui/react-components';
import { LAYER_SHAPES, type LayerShape } from '@hopwise/common';
import {
  SHAPE_LABELS,
  type LayerField,
  type LayerFormValues,
  type LayerName,
} from '../utils/layer-form';

const useStyles = makeStyles({
  card: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalM,
    padding: tokens.spacingHorizontalL,
    backgroundColor: tokens.colorNeutralBackground1,
    borderRadius: tokens.borderRadiusLarge,
    boxShadow: tokens.shadow4,
    borderTop: `4px solid ${tokens.colorBrandStroke1}`,
  },
  off: { opacity: 0.65, borderTop: `4px solid ${tokens.colorNeutralStroke2}` },
  head: { display: 'flex', alignItems: 'center', justifyContent: 'space-between' },
  fields: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(140px, 1fr))',
    gap: tokens.spacingHorizontalM,
  },
  // Fluent inputs have an intrinsic minimum width; let them shrink to the grid cell.
  control: { minWidth: 0, width: '100%' },
});

interface LayerFieldsProps {
  name: LayerName;
  values: LayerFormValues;
  errors?: Partial<Record<LayerField, string>>;
  onChange: (change: Partial<LayerFormValues>) => void;
}

/** The inputs of one layer of the builder. */
export function LayerFields({ name, values, errors = {}, onChange }: LayerFieldsProps) {
  const styles = useStyles();
  const disabled = !values.enabled;
  const props = (field: LayerField) => ({
    validationMessage: disabled ? undefined : errors[field],
    validationState: !disabled && errors[field] ? ('error' as const) : ('none' as const),
  });
  return (
    <section
      className={mergeClasses(styles.card, disabled && styles.off)}
      aria-label={`${name} layer`}
    >
      <div className={styles.head}>
        <Subtitle2 as="h3">{name} layer</Subtitle2>
        <Switch
          label={`Include ${name}`}
          checked={values.enabled}
          onChange={(_, data) => onChange({ enabled: data.checked })}
        />
      </div>
      <div className={styles.fields}>
        <Field label={`${name} shape`} {...props('shape')}>
          <Select
            className={styles.control}
            value={values.shape}
            disabled={disabled}
            onChange={(_, data) => onChange({ shape: data.value as LayerShape })}
          >
            {LAYER_SHAPES.map((shape) => (
              <option key={shape} value={shape}>
                {SHAPE_LABELS[shape]}
              </option>
            ))}
          </Select>
        </Field>
        <Field label={`${name} critical frequency (MHz)`} {...props('criticalFrequencyMHz')}>
          <Input
            className={styles.control}
            inputMode="decimal"
            disabled={disabled}
            value={values.criticalFrequencyMHz}
            onChange={(_, data) => onChange({ criticalFrequencyMHz: data.value })}
          />
        </Field>
        <Field label={`${name} peak height (km)`} {...props('peakHeightKm')}>
          <Input
            className={styles.control}
            inputMode="decimal"
            disabled={disabled}
            value={values.peakHeightKm}
            onChange={(_, data) => onChange({ peakHeightKm: data.value })}
          />
        </Field>
        <Field
          label={
            values.shape === 'chapman'
              ? `${name} scale height H (km)`
              : `${name} semi-thickness yₘ (km)`
          }
          {...props('thicknessKm')}
        >
          <Input
            className={styles.control}
            inputMode="decimal"
            disabled={disabled}
            value={values.thicknessKm}
            onChange={(_, data) => onChange({ thicknessKm: data.value })}
          />
        </Field>
      </div>
    </section>
  );
}
