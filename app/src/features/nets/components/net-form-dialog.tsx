import type { NetView, StationView } from '@hopwise/common';
import { Checkbox, Field, Input, Select, makeStyles, tokens } from '@fluentui/react-components';
import { useState } from 'react';
import { FormDialog } from '@/components/form-dialog';
import { useFormErrors, type FieldErrors } from '@/hooks/use-form-errors';
import { useNotify } from '@/hooks/use-notify';
import { useCreateNet } from '../api/create-net';
import { useUpdateNet } from '../api/update-net';
import { parseChannelsKHz } from './channels';

const useStyles = makeStyles({
  members: {
    display: 'flex',
    flexDirection: 'column',
    maxHeight: '220px',
    overflowY: 'auto',
    border: `1px solid ${tokens.colorNeutralStroke2}`,
    borderRadius: tokens.borderRadiusMedium,
    padding: tokens.spacingVerticalXS,
  },
});

interface Values {
  name: string;
  controlStationId: string;
  memberStationIds: number[];
  channels: string;
}
type FieldName = 'name' | 'controlStationId' | 'memberStationIds' | 'channelsKHz';
const FIELD_NAMES: FieldName[] = ['name', 'controlStationId', 'memberStationIds', 'channelsKHz'];

interface NetFormDialogProps {
  open: boolean;
  onOpenChange: (open: boolean) => void;
  stations: StationView[];
  net?: NetView;
}

/** Create or edit a net: control station, member stations, assigned channels. */
export function NetFormDialog(props: NetFormDialogProps) {
  if (!props.open) return null;
  return <NetForm {...props} />;
}

function NetForm({ open, onOpenChange, stations, net }: NetFormDialogProps) {
  const styles = useStyles();
  const notify = useNotify();
  const [values, setValues] = useState<Values>(() => ({
    name: net?.name ?? '',
    controlStationId: net ? String(net.controlStationId) : '',
    memberStationIds: net?.memberStationIds ?? [],
    channels: net?.channelsKHz.join(', ') ?? '',
  }));
  const done = (saved: NetView) => {
    notify('success', net ? 'Net updated' : 'Net created', saved.name);
    onOpenChange(false);
  };
  const create = useCreateNet({ onSuccess: done });
  const update = useUpdateNet({ onSuccess: done });
  const mutation = net ? update : create;
  const { setErrors, clearError, formError, fieldProps } = useFormErrors(
    FIELD_NAMES,
    mutation.error,
  );

  const set = <K extends keyof Values>(key: K, value: Values[K], field: FieldName) => {
    setValues((v) => ({ ...v, [key]: value }));
    clearError(field);
  };

  const onSubmit = () => {
    const found: FieldErrors<FieldName> = {};
    if (!values.name.trim()) found.name = 'Enter a name for the net.';
    if (!values.controlStationId) found.controlStationId = 'Choose the control station.';
    const members = values.memberStationIds.filter((id) => String(id) !== values.controlStationId);
    if (members.length === 0) found.memberStationIds = 'Choose at least one member station.';
    const channels = parseChannelsKHz(values.channels);
    if ('error' in channels) found.channelsKHz = channels.error;
    setErrors(found);
    if (Object.values(found).some(Boolean) || 'error' in channels) return;
    const input = {
      name: values.name.trim(),
      controlStationId: Number(values.controlStationId),
      memberStationIds: members,
      channelsKHz: channels.channelsKHz,
    };
    if (net) update.mutate({ id: net.id, change: input });
    else create.mutate(input);
  };

  const options = [...stations].sort((a, b) => a.name.localeCompare(b.name));
  const label = (s: StationView) => (s.callSign ? `${s.name} (${s.callSign})` : s.name);

  return (
    <FormDialog
      open={open}
      onOpenChange={onOpenChange}
      title={net ? `Edit ${net.name}` : 'Create a net'}
      onSubmit={onSubmit}
      submitLabel={net ? 'Save' : 'Create net'}
      pending={mutation.isPending}
      error={formError}
    >
      <Field label="Name" required {...fieldProps('name')}>
        <Input value={values.name} onChange={(_, d) => set('name', d.value, 'name')} />
      </Field>
      <Field label="Control station" required {...fieldProps('controlStationId')}>
        <Select
          value={values.controlStationId}
          onChange={(_, d) => set('controlStationId', d.value, 'controlStationId')}
        >
          <option value="">Choose a station…</option>
          {options.map((s) => (
            <option key={s.id} value={String(s.id)}>
              {label(s)}
            </option>
          ))}
        </Select>
      </Field>
      <Field label="Member stations (at least one)" {...fieldProps('memberStationIds')}>
        <div className={styles.members} role="group" aria-label="Member stations">
          {options
            .filter((s) => String(s.id) !== values.controlStationId)
            .map((s) => (
              <Checkbox
                key={s.id}
                label={label(s)}
                checked={values.memberStationIds.includes(s.id)}
                onChange={(_, d) =>
                  set(
                    'memberStationIds',
                    d.checked
                      ? [...values.memberStationIds, s.id]
                      : values.memberStationIds.filter((id) => id !== s.id),
                    'memberStationIds',
                  )
                }
              />
            ))}
        </div>
      </Field>
      <Field
        label="Assigned channels (kHz)"
        required
        hint="Whole kHz from 3000 to 30000, separated by commas or spaces. Use only channels your licence or assignment allows."
        {...fieldProps('channelsKHz')}
      >
        <Input
          value={values.channels}
          inputMode="numeric"
          placeholder="4625, 6998, 9145"
          onChange={(_, d) => set('channels', d.value, 'channelsKHz')}
        />
      </Field>
    </FormDialog>
  );
}
