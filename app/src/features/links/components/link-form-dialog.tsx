import {
  Button,
  Dialog,
  DialogActions,
  DialogBody,
  DialogContent,
  DialogSurface,
  DialogTitle,
  Field,
  Input,
  MessageBar,
  MessageBarBody,
  Select,
  Spinner,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { useState, type FormEvent } from 'react';
import { useNotify } from '@/hooks/use-notify';
import { isApiError } from '@/lib/api-client';
import type { HfLink, Station } from '@/types/links';
import { useCreateLink } from '../api/create-link';
import { useUpdateLink } from '../api/update-link';

const useStyles = makeStyles({
  form: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
});

interface Values {
  name: string;
  fromStationId: string;
  toStationId: string;
}
type FieldName = keyof Values;
type FieldErrors = Partial<Record<FieldName, string>>;
const FIELD_NAMES: FieldName[] = ['name', 'fromStationId', 'toStationId'];

function validate(values: Values): FieldErrors {
  const errors: FieldErrors = {};
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
  const styles = useStyles();
  const notify = useNotify();
  const [values, setValues] = useState<Values>(() => ({
    name: link?.name ?? '',
    fromStationId: String(link?.fromStationId ?? fromStationId ?? ''),
    toStationId: String(link?.toStationId ?? ''),
  }));
  const [errors, setErrors] = useState<FieldErrors>({});
  const done = (saved: HfLink) => {
    notify('success', link ? 'Link updated' : 'Link added', saved.name);
    onOpenChange(false);
  };
  const create = useCreateLink({ onSuccess: done });
  const update = useUpdateLink({ onSuccess: done });
  const mutation = link ? update : create;

  const serverFields = isApiError(mutation.error) ? mutation.error.fields : undefined;
  const namesAField = Object.keys(serverFields ?? {}).some((name) =>
    FIELD_NAMES.includes(name as FieldName),
  );
  const formError = mutation.error && !namesAField ? mutation.error.message : undefined;

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
    setErrors((previous) => ({ ...previous, [name]: undefined }));
  };

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
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

  const message = (name: FieldName) => errors[name] ?? serverFields?.[name];
  const fieldProps = (name: FieldName) => ({
    validationMessage: message(name),
    validationState: message(name) ? ('error' as const) : ('none' as const),
  });
  const options = [...stations].sort((a, b) => a.name.localeCompare(b.name));

  return (
    <Dialog open={open} onOpenChange={(_, data) => onOpenChange(data.open)}>
      <DialogSurface aria-describedby={undefined}>
        <form onSubmit={onSubmit} noValidate>
          <DialogBody>
            <DialogTitle>{link ? `Edit ${link.name}` : 'Add a link'}</DialogTitle>
            <DialogContent className={styles.form}>
              {formError && (
                <MessageBar intent="error" role="alert">
                  <MessageBarBody>{formError}</MessageBarBody>
                </MessageBar>
              )}
              {stations.length < 2 && (
                <MessageBar intent="info">
                  <MessageBarBody>A link needs two stations: add them first.</MessageBarBody>
                </MessageBar>
              )}
              <Field label="From station" required {...fieldProps('fromStationId')}>
                <Select
                  value={values.fromStationId}
                  onChange={(_, data) => set('fromStationId', data.value)}
                >
                  <option value="">Choose a station…</option>
                  {options.map((s) => (
                    <option key={s.id} value={String(s.id)}>
                      {s.name}
                      {s.callSign ? ` (${s.callSign})` : ''}
                    </option>
                  ))}
                </Select>
              </Field>
              <Field label="To station" required {...fieldProps('toStationId')}>
                <Select
                  value={values.toStationId}
                  onChange={(_, data) => set('toStationId', data.value)}
                >
                  <option value="">Choose a station…</option>
                  {options.map((s) => (
                    <option key={s.id} value={String(s.id)}>
                      {s.name}
                      {s.callSign ? ` (${s.callSign})` : ''}
                    </option>
                  ))}
                </Select>
              </Field>
              <Field label="Link name" required {...fieldProps('name')}>
                <Input
                  autoComplete="off"
                  value={values.name}
                  onChange={(_, data) => set('name', data.value)}
                />
              </Field>
            </DialogContent>
            <DialogActions>
              <Button appearance="secondary" onClick={() => onOpenChange(false)}>
                Cancel
              </Button>
              <Button
                type="submit"
                appearance="primary"
                disabled={mutation.isPending}
                icon={mutation.isPending ? <Spinner size="tiny" aria-hidden /> : undefined}
              >
                {mutation.isPending ? 'Saving…' : link ? 'Save link' : 'Add link'}
              </Button>
            </DialogActions>
          </DialogBody>
        </form>
      </DialogSurface>
    </Dialog>
  );
}
