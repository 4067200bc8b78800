import {
  Button,
  Caption1,
  Field,
  Input,
  MessageBar,
  MessageBarBody,
  Radio,
  RadioGroup,
  Select,
  Spinner,
  Subtitle2,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { Eye20Regular, Play20Regular } from '@fluentui/react-icons';
import {
  STUDY_FREQUENCY_MAX_MHZ as MAX_MHZ,
  STUDY_FREQUENCY_MIN_MHZ as MIN_MHZ,
  type ProfileData,
} from '@hopwise/common';
import { DateTime } from 'luxon';
import { useState, type FormEvent } from 'react';
import type { ProfileSource, ReferenceProfile } from '@/types/links';
import { formatUtcAndLocal } from '@/utils/format-time';
import { MAX_STUDY_FREQUENCIES, sweepFrequencies } from '../utils/frequencies';

const useStyles = makeStyles({
  form: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(min(280px, 100%), 1fr))',
    alignItems: 'start',
    gap: `${tokens.spacingVerticalL} ${tokens.spacingHorizontalXXL}`,
    padding: tokens.spacingHorizontalL,
    backgroundColor: tokens.colorNeutralBackground1,
    borderRadius: tokens.borderRadiusLarge,
    boxShadow: tokens.shadow4,
  },
  group: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalS,
    border: 'none',
    margin: 0,
    padding: 0,
  },
  row: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(120px, 1fr))',
    gap: tokens.spacingHorizontalM,
  },
  legend: { padding: 0, marginBottom: tokens.spacingVerticalXS },
  muted: { color: tokens.colorNeutralForeground3 },
  actions: {
    display: 'flex',
    flexWrap: 'wrap',
    gap: tokens.spacingHorizontalM,
    gridColumn: '1 / -1',
  },
});

/** What the form hands over: the request to save, and the profile it resolves to (for previews). */
export interface StudyRequest {
  atUtc: string;
  name?: string;
  profileSource: ProfileSource;
  profile: ProfileData;
  frequenciesMHz: number[];
}

interface LayerValues {
  foEMHz: string;
  hmEKm: string;
  ymEKm: string;
  foF2MHz: string;
  hmF2Km: string;
  scaleHeightF2Km: string;
}

// E layer at 110 km with a 20 km semi-thickness, as in ITU-R P.533 (SPEC §4); the F2 values are
// a plausible mid-latitude daytime layer (invented demo defaults).
const DEFAULT_LAYERS: LayerValues = {
  foEMHz: '3.0',
  hmEKm: '110',
  ymEKm: '20',
  foF2MHz: '8.0',
  hmF2Km: '300',
  scaleHeightF2Km: '50',
};

type FieldErrors = Record<string, string | undefined>;

const toInputUtc = (date: DateTime) => date.toUTC().toFormat("yyyy-MM-dd'T'HH:mm");

function layersFrom(values: LayerValues): ProfileData {
  return {
    layers: [
      {
        name: 'E',
        shape: 'parabolic',
        criticalFrequencyMHz: Number(values.foEMHz),
        peakHeightKm: Number(values.hmEKm),
        semiThicknessKm: Number(values.ymEKm),
      },
      {
        name: 'F2',
        shape: 'chapman',
        criticalFrequencyMHz: Number(values.foF2MHz),
        peakHeightKm: Number(values.hmF2Km),
        scaleHeightKm: Number(values.scaleHeightF2Km),
      },
    ],
  };
}

const positive = (value: string) => value.trim() !== '' && Number(value) > 0;

interface StudyFormProps {
  references: ReferenceProfile[];
  referencesLoading: boolean;
  referencesError?: string;
  busy: boolean;
  previewBusy: boolean;
  onRun: (request: StudyRequest) => void;
  onPreview: (request: StudyRequest) => void;
  /** Field errors the server returned for the last run. */
  serverFields?: Record<string, string>;
}

export function StudyForm({
  references,
  referencesLoading,
  referencesError,
  busy,
  previewBusy,
  onRun,
  onPreview,
  serverFields,
}: StudyFormProps) {
  const styles = useStyles();
  const [atUtc, setAtUtc] = useState(() => toInputUtc(DateTime.utc().startOf('hour')));
  const [name, setName] = useState('');
  const [profileKind, setProfileKind] = useState<'reference' | 'inline'>('reference');
  const [referenceKey, setReferenceKey] = useState('');
  const [layers, setLayers] = useState<LayerValues>(DEFAULT_LAYERS);
  const [frequencyMode, setFrequencyMode] = useState<'single' | 'sweep'>('single');
  const [frequencyMHz, setFrequencyMHz] = useState('9');
  const [sweep, setSweep] = useState({ startMHz: '3', stopMHz: '15', stepMHz: '1' });
  const [errors, setErrors] = useState<FieldErrors>({});

  const chosenKey = referenceKey || references[0]?.key || '';
  const chosenReference = references.find((r) => r.key === chosenKey);
  const atIso = `${atUtc}:00Z`;
  const when = formatUtcAndLocal(atIso);

  const validate = (): StudyRequest | undefined => {
    const found: FieldErrors = {};
    if (!DateTime.fromISO(atIso, { zone: 'utc' }).isValid) found.atUtc = 'Enter a date and time.';
    let profile: ProfileData | undefined;
    let profileSource: ProfileSource | undefined;
    if (profileKind === 'reference') {
      if (!chosenReference) found.referenceKey = 'Choose a reference profile.';
      else {
        profile = chosenReference.profile;
        profileSource = { kind: 'reference', key: chosenReference.key };
      }
    } else {
      for (const key of Object.keys(layers) as (keyof LayerValues)[]) {
        if (!positive(layers[key])) found[key] = 'Enter a positive number.';
      }
      if (!found.hmF2Km && !found.hmEKm && Number(layers.hmF2Km) <= Number(layers.hmEKm)) {
        found.hmF2Km = 'The F2 peak must lie above the E peak.';
      }
      profile = layersFrom(layers);
      profileSource = { kind: 'inline', profile };
    }
    let frequenciesMHz: number[] = [];
    if (frequencyMode === 'single') {
      const f = Number(frequencyMHz);
      if (!(frequencyMHz.trim() !== '' && f >= MIN_MHZ && f <= MAX_MHZ)) {
        found.frequencyMHz = `Enter a frequency from ${MIN_MHZ} to ${MAX_MHZ} MHz.`;
      } else frequenciesMHz = [f];
    } else {
      const start = Number(sweep.startMHz);
      const stop = Number(sweep.stopMHz);
      const step = Number(sweep.stepMHz);
      const range = `From ${MIN_MHZ} to ${MAX_MHZ} MHz.`;
      if (!(start >= MIN_MHZ && start <= MAX_MHZ)) found.startMHz = range;
      if (!(stop >= MIN_MHZ && stop <= MAX_MHZ)) found.stopMHz = range;
      else if (stop < start) found.stopMHz = 'Must not be below the start.';
      if (!(step > 0)) found.stepMHz = 'Enter a positive step.';
      if (!found.startMHz && !found.stopMHz && !found.stepMHz) {
        frequenciesMHz = sweepFrequencies(start, stop, step);
        if (frequenciesMHz.length > MAX_STUDY_FREQUENCIES) {
          found.stepMHz = `That gives ${frequenciesMHz.length} frequencies; at most ${MAX_STUDY_FREQUENCIES}. Use a larger step.`;
        }
      }
    }
    setErrors(found);
    if (Object.values(found).some(Boolean) || !profile || !profileSource) return undefined;
    return {
      atUtc:
        DateTime.fromISO(atIso, { zone: 'utc' }).toISO({ suppressMilliseconds: true }) ?? atIso,
      name: name.trim() || undefined,
      profileSource,
      profile,
      frequenciesMHz,
    };
  };

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const request = validate();
    if (request) onRun(request);
  };

  const message = (key: string, serverKey?: string) =>
    errors[key] ?? (serverKey ? serverFields?.[serverKey] : undefined);
  const fieldProps = (key: string, serverKey?: string) => ({
    validationMessage: message(key, serverKey),
    validationState: message(key, serverKey) ? ('error' as const) : ('none' as const),
  });
  const layerInput = (key: keyof LayerValues, label: string) => (
    <Field label={label} {...fieldProps(key)}>
      <Input
        inputMode="decimal"
        value={layers[key]}
        onChange={(_, data) => setLayers((previous) => ({ ...previous, [key]: data.value }))}
      />
    </Field>
  );

  return (
    <form className={styles.form} onSubmit={onSubmit} noValidate aria-label="Study settings">
      <fieldset className={styles.group}>
        <legend className={styles.legend}>
          <Subtitle2>When</Subtitle2>
        </legend>
        <Field
          label="Time (UTC)"
          hint={`Local: ${when.localShort}`}
          required
          {...fieldProps('atUtc', 'atUtc')}
        >
          <Input type="datetime-local" value={atUtc} onChange={(_, data) => setAtUtc(data.value)} />
        </Field>
      </fieldset>

      <fieldset className={styles.group}>
        <legend className={styles.legend}>
          <Subtitle2>Ionosphere</Subtitle2>
        </legend>
        <Field label="Profile source">
          <RadioGroup
            value={profileKind}
            layout="horizontal"
            onChange={(_, data) => setProfileKind(data.value === 'inline' ? 'inline' : 'reference')}
          >
            <Radio value="reference" label="From the reference set" />
            <Radio value="inline" label="From layer parameters" />
          </RadioGroup>
        </Field>
        {profileKind === 'reference' ? (
          <>
            {referencesError && (
              <MessageBar intent="error" role="alert">
                <MessageBarBody>
                  Could not load the reference profiles: {referencesError}
                </MessageBarBody>
              </MessageBar>
            )}
            <Field
              label="Reference profile"
              {...fieldProps('referenceKey', 'profileSource.key')}
              hint={chosenReference?.description}
            >
              <Select
                value={chosenKey}
                disabled={referencesLoading}
                onChange={(_, data) => setReferenceKey(data.value)}
              >
                {referencesLoading && <option value="">Loading…</option>}
                {references.map((r) => (
                  <option key={r.key} value={r.key}>
                    {r.name}
                  </option>
                ))}
              </Select>
            </Field>
          </>
        ) : (
          <>
            <Caption1 className={styles.muted}>
              E: parabolic layer; F2: α-Chapman layer. Densities add up.
            </Caption1>
            <div className={styles.row}>
              {layerInput('foEMHz', 'foE (MHz)')}
              {layerInput('hmEKm', 'hmE (km)')}
              {layerInput('ymEKm', 'E semi-thickness (km)')}
            </div>
            <div className={styles.row}>
              {layerInput('foF2MHz', 'foF2 (MHz)')}
              {layerInput('hmF2Km', 'hmF2 (km)')}
              {layerInput('scaleHeightF2Km', 'F2 scale height (km)')}
            </div>
          </>
        )}
      </fieldset>

      <fieldset className={styles.group}>
        <legend className={styles.legend}>
          <Subtitle2>Frequencies</Subtitle2>
        </legend>
        <RadioGroup
          aria-label="Frequency choice"
          value={frequencyMode}
          layout="horizontal"
          onChange={(_, data) => setFrequencyMode(data.value === 'sweep' ? 'sweep' : 'single')}
        >
          <Radio value="single" label="One frequency" />
          <Radio value="sweep" label="Sweep" />
        </RadioGroup>
        {frequencyMode === 'single' ? (
          <Field label="Frequency (MHz)" {...fieldProps('frequencyMHz', 'frequenciesMHz')}>
            <Input
              inputMode="decimal"
              value={frequencyMHz}
              onChange={(_, data) => setFrequencyMHz(data.value)}
            />
          </Field>
        ) : (
          <div className={styles.row}>
            {(['startMHz', 'stopMHz', 'stepMHz'] as const).map((key) => (
              <Field
                key={key}
                label={
                  { startMHz: 'Start (MHz)', stopMHz: 'Stop (MHz)', stepMHz: 'Step (MHz)' }[key]
                }
                {...fieldProps(key, key === 'stepMHz' ? 'frequenciesMHz' : undefined)}
              >
                <Input
                  inputMode="decimal"
                  value={sweep[key]}
                  onChange={(_, data) =>
                    setSweep((previous) => ({ ...previous, [key]: data.value }))
                  }
                />
              </Field>
            ))}
          </div>
        )}
      </fieldset>

      <Field label="Study name" hint="Optional; shown in the studies list.">
        <Input value={name} onChange={(_, data) => setName(data.value)} />
      </Field>

      <div className={styles.actions}>
        <Button
          type="submit"
          appearance="primary"
          disabled={busy}
          icon={busy ? <Spinner size="tiny" aria-hidden /> : <Play20Regular />}
        >
          {busy ? 'Running…' : 'Run and save'}
        </Button>
        <Button
          disabled={previewBusy}
          icon={previewBusy ? <Spinner size="tiny" aria-hidden /> : <Eye20Regular />}
          onClick={() => {
            const request = validate();
            if (request) onPreview(request);
          }}
        >
          Preview without saving
        </Button>
      </div>
    </form>
  );
}
