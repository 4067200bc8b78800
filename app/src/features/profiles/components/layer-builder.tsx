import {
  Button,
  Caption1,
  Checkbox,
  Field,
  Input,
  MessageBar,
  MessageBarBody,
  Subtitle2,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import type { LayerInput } from '@hopwise/common';
import { DateTime } from 'luxon';
import { useEffect, useMemo, useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useNotify } from '@/hooks/use-notify';
import { isApiError } from '@/lib/api-client';
import { useCreateProfile } from '../api/create-profile';
import { useDebouncedValue } from '../hooks/use-debounced-value';
import {
  DEFAULT_LAYER_FORM,
  LAYER_NAMES,
  readLayerForm,
  type LayerForm,
  type LayerFormValues,
  type LayerName,
} from '../utils/layer-form';
import { LayerFields } from './layer-fields';
import { ProfileCharts } from './profile-charts';

const useStyles = makeStyles({
  stack: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXL },
  layers: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(min(340px, 100%), 1fr))',
    gap: tokens.spacingHorizontalL,
  },
  meta: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(180px, 1fr))',
    gap: tokens.spacingHorizontalL,
    alignItems: 'end',
  },
  actions: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalM },
  muted: { color: tokens.colorNeutralForeground3 },
});

const nowUtcInputValue = () => DateTime.utc().startOf('hour').toFormat("yyyy-MM-dd'T'HH:mm");

/** Build a profile from E, F1 and F2 layer parameters, with live previews, and save it. */
export function LayerBuilder({ canPublish }: { canPublish: boolean }) {
  const styles = useStyles();
  const notify = useNotify();
  const navigate = useNavigate();
  const [form, setForm] = useState<LayerForm>(DEFAULT_LAYER_FORM);
  const [name, setName] = useState('');
  const [validAt, setValidAt] = useState(nowUtcInputValue);
  const [lat, setLat] = useState('');
  const [lon, setLon] = useState('');
  const [publish, setPublish] = useState(false);
  const [metaErrors, setMetaErrors] = useState<Record<string, string>>({});

  // Memoised so the same form gives the same `layers` object (the debounce compares identity).
  const result = useMemo(() => readLayerForm(form), [form]);
  const [lastValid, setLastValid] = useState<LayerInput[] | null>(result.layers);
  useEffect(() => {
    if (result.layers) setLastValid(result.layers);
  }, [result.layers]);
  const debounced = useDebouncedValue(lastValid, 450);
  const liveBody = useMemo(() => (lastValid ? { layers: lastValid } : null), [lastValid]);
  const request = useMemo(() => (debounced ? { layers: debounced } : null), [debounced]);

  const create = useCreateProfile({
    onSuccess: (row) => {
      notify('success', 'Profile saved', `“${row.name}” is in the library.`);
      navigate(paths.profileDetail.getHref(row.id));
    },
  });
  const serverFields = isApiError(create.error) ? create.error.fields : undefined;

  const change = (layer: LayerName) => (patch: Partial<LayerFormValues>) =>
    setForm((previous) => ({ ...previous, [layer]: { ...previous[layer], ...patch } }));

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const errors: Record<string, string> = {};
    if (!name.trim()) errors.name = 'Give the profile a name.';
    const latDeg = lat.trim() === '' ? undefined : Number(lat);
    const lonDeg = lon.trim() === '' ? undefined : Number(lon);
    if (latDeg !== undefined && !(Math.abs(latDeg) <= 90))
      errors.latDeg = 'Latitude is a number from −90 to 90.';
    if (lonDeg !== undefined && !(Math.abs(lonDeg) <= 180))
      errors.lonDeg = 'Longitude is a number from −180 to 180.';
    const valid = validAt ? DateTime.fromISO(validAt, { zone: 'utc' }) : null;
    if (valid && !valid.isValid) errors.validAtUtc = 'Enter a date and time.';
    setMetaErrors(errors);
    if (Object.keys(errors).length > 0 || !result.layers) return;
    create.mutate({
      name: name.trim(),
      validAtUtc: valid?.toISO({ suppressMilliseconds: true }) ?? undefined,
      latDeg,
      lonDeg,
      profile: { layers: result.layers },
      published: canPublish ? publish : undefined,
    });
  };

  const metaProps = (field: string) => {
    const message = metaErrors[field] ?? serverFields?.[field];
    return {
      validationMessage: message,
      validationState: message ? ('error' as const) : ('none' as const),
    };
  };
  const otherServerError =
    create.isError && !Object.keys(serverFields ?? {}).some((k) => k in metaErrors || k === 'name')
      ? create.error.message
      : undefined;

  return (
    <form className={styles.stack} onSubmit={onSubmit} noValidate aria-label="Build a profile">
      <div className={styles.layers}>
        {LAYER_NAMES.map((layer) => (
          <LayerFields
            key={layer}
            name={layer}
            values={form[layer]}
            errors={result.errors[layer]}
            onChange={change(layer)}
          />
        ))}
      </div>
      <Caption1 className={styles.muted}>
        The starting values are illustrative, not a forecast: E at 110 km with a 20 km
        semi-thickness follows ITU-R P.533; the critical frequencies and the F1 and F2 values are
        typical of a quiet mid-latitude day. Densities of the layers add up.
      </Caption1>
      {result.formError && (
        <MessageBar intent="warning">
          <MessageBarBody>{result.formError}</MessageBarBody>
        </MessageBar>
      )}

      <section aria-label="Preview">
        <Subtitle2 as="h2">Preview</Subtitle2>
        {liveBody && request ? (
          <ProfileCharts body={liveBody} request={request} label={name.trim() || 'New profile'} />
        ) : (
          <Caption1>Fill in the layers to see the profile.</Caption1>
        )}
        {!result.layers && lastValid && (
          <Caption1 className={styles.muted}>
            The preview shows the last valid set of layers until the fields above are corrected.
          </Caption1>
        )}
      </section>

      <section aria-label="Save" className={styles.stack}>
        <Subtitle2 as="h2">Save to the library</Subtitle2>
        <div className={styles.meta}>
          <Field label="Name" required {...metaProps('name')}>
            <Input value={name} onChange={(_, d) => setName(d.value)} />
          </Field>
          <Field label="Valid at (UTC)" hint="Read as UTC." {...metaProps('validAtUtc')}>
            <Input type="datetime-local" value={validAt} onChange={(_, d) => setValidAt(d.value)} />
          </Field>
          <Field label="Latitude (°, north positive)" {...metaProps('latDeg')}>
            <Input inputMode="decimal" value={lat} onChange={(_, d) => setLat(d.value)} />
          </Field>
          <Field label="Longitude (°, east positive)" {...metaProps('lonDeg')}>
            <Input inputMode="decimal" value={lon} onChange={(_, d) => setLon(d.value)} />
          </Field>
        </div>
        {canPublish && (
          <Checkbox
            label="Publish to the shared library"
            checked={publish}
            onChange={(_, data) => setPublish(data.checked === true)}
          />
        )}
        {otherServerError && (
          <MessageBar intent="error" role="alert">
            <MessageBarBody>Could not save: {otherServerError}</MessageBarBody>
          </MessageBar>
        )}
        <div className={styles.actions}>
          <Button type="submit" appearance="primary" disabled={create.isPending || !result.layers}>
            {create.isPending ? 'Saving…' : 'Save profile'}
          </Button>
        </div>
      </section>
    </form>
  );
}
