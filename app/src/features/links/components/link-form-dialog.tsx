import { Field, Input, MessageBar, MessageBarBody, Select } from '@fluentui/react-components';
import { useState } from 'react';
import { FormDialog } from '@/components/form-dialog';
import { useFormErrors, type FieldErrors } from '@/hooks/use-form-errors';
import { useNotify } from '@/hooks/use-notify';
import type { HfLink, Station } from '@/types/links';
import { useCreateLink } from '../api/create-link';
import { useUpdateLink } from '../api/update-link';

interface Values {
  name: string;
  fromStationId: string;
  toStationId: string;
}
type FieldName = keyof Values;
const FIELD_NAMES: FieldName[] = ['name', 'fromStationId', 'toStationId'];

function validate(values: Values): FieldErrors<FieldName> {
  const errors: FieldErrors<FieldName> = {};
  if (!values.name.trim()) errors.name = 'Enter a name for the link.';
  if (!values.fromStationId) errors.fromStationId = 'Choose the station at one end.';
  if (!values.toStationId) errors.toStationId = 'Choose the station at the other end.';
  else if (values.toStationId === values.fromStationId) {
    errors.toStationId = 'Choose a different station from the first one.';
  }
  return errors;
}

interface LinkFormDialogProps {
  open: boolean;
  onOpenChange: (open: boolean) => void;
  stations: Station[];
  /** The link to edit; without it the dialog adds a new one. */
  link?: HfLink;
  /** A new link starting at this station (from the map's station panel). */
  fromStationId?: number;
}

/** Add or edit a link between two stations. */
export function LinkFormDialog(props: LinkFormDialogProps) {
  if (!props.open) return null;
  return <LinkForm {...props} />;
}

function LinkForm({ open, onOpenChange, stations, link, fromStationId }: LinkFormDialogProps) {
  const notify = useNotify();
  const [values, setValues] = useState<Values>(() => ({
    name: link?.name ?? '',
    fromStationId: String(link?.fromStationId ?? fromStationId ?? ''),
    toStationId: String(link?.toStationId ?? ''),
  }));
  const done = (saved: HfLink) => {
    notify('success', link ? 'Link updated' : 'Link added', saved.name);
    onOpenChange(false);
  };
  const create = useCreateLink({ onSuccess: done });
  const update = useUpdateLink({ onSuccess: done });
  const mutation = link ? update : create;
  const { setErrors, clearError, formError, fieldProps } = useFormErrors(
    FIELD_NAMES,
    mutation.error,
  );

  const set = (name: FieldName, value: string) => {
    setValues((previous) => {
      const next = { ...previous, [name]: value };
      // Suggest "A – B" as the name until the user types one.
      const auto = (v: Values) => {
        const a = stations.find((s) => String(s.id) === v.fromStationId)?.name;
        const b = stations.find((s) => String(s.id) === v.toStationId)?.name;
        return a && b ? `${a} – ${b}` : '';
      };
      if (name !== 'name' && (previous.name === '' || previous.name === auto(previous))) {
        next.name = auto(next);
      }
      return next;
    });
    clearError(name);
  };

  const onSubmit = () => {
    const found = validate(values);
    setErrors(found);
    if (Object.values(found).some(Boolean)) return;
    const input = {
      name: values.name.trim(),
      fromStationId: Number(values.fromStationId),
      toStationId: Number(values.toStationId),
    };
    if (link) update.mutate({ id: link.id, change: input });
    else create.mutate(input);
  };

  const options = [...stations].sort((a, b) => a.name.localeCompare(b.name));
  const stationSelect = (name: 'fromStationId' | 'toStationId') => (
    <Select value={values[name]} onChange={(_, data) => set(name, data.value)}>
      <option value="">Choose a station…</option>
      {options.map((s) => (
        <option key={s.id} value={String(s.id)}>
          {s.name}
          {s.callSign ? ` (${s.callSign})` : ''}
        </option>
      ))}
    </Select>
  );

  return (
    <FormDialog
      open={open}
      onOpenChange={onOpenChange}
      title={link ? `Edit ${link.name}` : 'Add a link'}
      onSubmit={onSubmit}
      submitLabel={link ? 'Save link' : 'Add link'}
      pendingLabel="Saving…"
      pending={mutation.isPending}
      error={formError}
    >
      {stations.length < 2 && (
        <MessageBar intent="info">
          <MessageBarBody>A link needs two stations: add them first.</MessageBarBody>
        </MessageBar>
      )}
      <Field label="From station" required {...fieldProps('fromStationId')}>
        {stationSelect('fromStationId')}
      </Field>
      <Field label="To station" required {...fieldProps('toStationId')}>
        {stationSelect('toStationId')}
      </Field>
      <Field label="Link name" required {...fieldProps('name')}>
        <Input
          autoComplete="off"
          value={values.name}
          onChange={(_, data) => set('name', data.value)}
        />
      </Field>
    </FormDialog>
  );
}
