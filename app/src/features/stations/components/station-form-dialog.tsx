import { Checkbox, Field, Input, Textarea, makeStyles, tokens } from '@fluentui/react-components';
import { useState } from 'react';
import { FormDialog } from '@/components/form-dialog';
import { useFormErrors, type FieldErrors } from '@/hooks/use-form-errors';
import { useNotify } from '@/hooks/use-notify';
import type { Station, StationInput } from '@/types/links';
import { useCreateStation } from '../api/create-station';
import { useUpdateStation } from '../api/update-station';

const useStyles = makeStyles({
  row: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(140px, 1fr))',
    gap: tokens.spacingHorizontalM,
  },
});

interface Values {
  name: string;
  callSign: string;
  latDeg: string;
  lonDeg: string;
  elevationM: string;
  notes: string;
  shared: boolean;
}
type FieldName = Exclude<keyof Values, 'shared'> | 'shared';

const FIELD_NAMES: FieldName[] = [
  'name',
  'callSign',
  'latDeg',
  'lonDeg',
  'elevationM',
  'notes',
  'shared',
];

/** Where a new station starts: a map click passes its position. */
export interface StationDraft {
  latDeg?: number;
  lonDeg?: number;
}

const text = (value: number | string | null | undefined) =>
  value === null || value === undefined ? '' : String(value);

function initialValues(station?: Station, draft?: StationDraft): Values {
  if (station) {
    return {
      name: station.name,
      callSign: text(station.callSign),
      latDeg: text(station.latDeg),
      lonDeg: text(station.lonDeg),
      elevationM: text(station.elevationM),
      notes: text(station.notes),
      shared: station.shared,
    };
  }
  // Four decimals of a degree ≈ 11 m: plenty for an HF station placed by a click.
  const round = (deg?: number) => (deg === undefined ? '' : String(Math.round(deg * 1e4) / 1e4));
  return {
    name: '',
    callSign: '',
    latDeg: round(draft?.latDeg),
    lonDeg: round(draft?.lonDeg),
    elevationM: '',
    notes: '',
    shared: false,
  };
}

const parseNumber = (value: string) => (value.trim() === '' ? Number.NaN : Number(value.trim()));

function validate(values: Values): { errors: FieldErrors<FieldName>; input?: StationInput } {
  const errors: FieldErrors<FieldName> = {};
  const latDeg = parseNumber(values.latDeg);
  const lonDeg = parseNumber(values.lonDeg);
  const elevationM = values.elevationM.trim() === '' ? undefined : Number(values.elevationM);
  if (!values.name.trim()) errors.name = 'Enter a name for the station.';
  if (!(latDeg >= -90 && latDeg <= 90)) errors.latDeg = 'Enter a latitude from −90 to 90 degrees.';
  if (!(lonDeg >= -180 && lonDeg <= 180)) {
    errors.lonDeg = 'Enter a longitude from −180 to 180 degrees.';
  }
  if (elevationM !== undefined && !Number.isFinite(elevationM)) {
    errors.elevationM = 'Enter the height above sea level in metres, or leave it empty.';
  }
  if (Object.keys(errors).length > 0) return { errors };
  return {
    errors,
    input: {
      name: values.name.trim(),
      callSign: values.callSign.trim() || undefined,
      latDeg,
      lonDeg,
      elevationM,
      notes: values.notes.trim() || undefined,
      shared: values.shared,
    },
  };
}

interface StationFormDialogProps {
  open: boolean;
  onOpenChange: (open: boolean) => void;
  /** The station to edit; without it the dialog adds a new one. */
  station?: Station;
  draft?: StationDraft;
  onSaved?: (station: Station) => void;
}

/** Add or edit a station, with the server's field-level errors beside each field. */
export function StationFormDialog(props: StationFormDialogProps) {
  // Remount the form each time the dialog opens so it starts from the current station or draft.
  if (!props.open) return null;
  return <StationForm {...props} />;
}

function StationForm({ open, onOpenChange, station, draft, onSaved }: StationFormDialogProps) {
  const styles = useStyles();
  const notify = useNotify();
  const [values, setValues] = useState<Values>(() => initialValues(station, draft));
  const done = (saved: Station) => {
    notify('success', station ? 'Station updated' : 'Station added', saved.name);
    onSaved?.(saved);
    onOpenChange(false);
  };
  const create = useCreateStation({ onSuccess: done });
  const update = useUpdateStation({ onSuccess: done });
  const mutation = station ? update : create;
  const { setErrors, clearError, formError, fieldProps } = useFormErrors(
    FIELD_NAMES,
    mutation.error,
  );

  const set = <K extends keyof Values>(name: K, value: Values[K]) => {
    setValues((previous) => ({ ...previous, [name]: value }));
    clearError(name);
  };

  const onSubmit = () => {
    const { errors: found, input } = validate(values);
    setErrors(found);
    if (!input) return;
    if (station) update.mutate({ id: station.id, change: input });
    else create.mutate(input);
  };

  return (
    <FormDialog
      open={open}
      onOpenChange={onOpenChange}
      title={station ? `Edit ${station.name}` : 'Add a station'}
      onSubmit={onSubmit}
      submitLabel={station ? 'Save station' : 'Add station'}
      pendingLabel="Saving…"
      pending={mutation.isPending}
      error={formError}
    >
      <div className={styles.row}>
        <Field label="Station name" required {...fieldProps('name')}>
          <Input
            autoComplete="off"
            value={values.name}
            onChange={(_, data) => set('name', data.value)}
          />
        </Field>
        <Field label="Call sign" {...fieldProps('callSign')}>
          <Input
            autoComplete="off"
            value={values.callSign}
            onChange={(_, data) => set('callSign', data.value)}
          />
        </Field>
      </div>
      <div className={styles.row}>
        <Field label="Latitude (°)" hint="North positive" required {...fieldProps('latDeg')}>
          <Input
            inputMode="decimal"
            value={values.latDeg}
            onChange={(_, data) => set('latDeg', data.value)}
          />
        </Field>
        <Field label="Longitude (°)" hint="East positive" required {...fieldProps('lonDeg')}>
          <Input
            inputMode="decimal"
            value={values.lonDeg}
            onChange={(_, data) => set('lonDeg', data.value)}
          />
        </Field>
        <Field label="Elevation (m)" {...fieldProps('elevationM')}>
          <Input
            inputMode="decimal"
            value={values.elevationM}
            onChange={(_, data) => set('elevationM', data.value)}
          />
        </Field>
      </div>
      <Field label="Notes" {...fieldProps('notes')}>
        <Textarea
          value={values.notes}
          onChange={(_, data) => set('notes', data.value)}
          resize="vertical"
        />
      </Field>
      <Field {...fieldProps('shared')}>
        <Checkbox
          checked={values.shared}
          onChange={(_, data) => set('shared', data.checked === true)}
          label="Share this station with everyone on this Hopwise site"
        />
      </Field>
    </FormDialog>
  );
}
