import {
  Button,
  Caption1,
  Field,
  Input,
  MessageBar,
  MessageBarActions,
  MessageBarBody,
  MessageBarTitle,
  ProgressBar,
  Radio,
  RadioGroup,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { DateTime } from 'luxon';
import { useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { isApiError } from '@/lib/api-client';
import type { UploadProgress } from '@/lib/upload';
import {
  uploadRowErrors,
  useUploadFile,
  type UploadKind,
  type UploadResult,
} from '../api/upload-file';
import { DropZone } from './drop-zone';
import { UploadRowErrors } from './upload-row-errors';

const useStyles = makeStyles({
  form: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalL,
    maxWidth: '760px',
  },
  row: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(160px, 1fr))',
    gap: tokens.spacingHorizontalL,
  },
  actions: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalM },
  formats: { color: tokens.colorNeutralForeground3 },
  code: { fontFamily: tokens.fontFamilyMonospace },
});

type FieldName = 'name' | 'timeUtc' | 'latDeg' | 'lonDeg' | 'file';
type FieldErrors = Partial<Record<FieldName, string>>;

const KIND_TEXT: Record<UploadKind, { time: string; headers: string[] }> = {
  samples: {
    time: 'Valid at (UTC)',
    headers: ['heightKm,electronDensityPerM3', 'heightKm,plasmaFrequencyMHz'],
  },
  trace: { time: 'Observed at (UTC)', headers: ['frequencyMHz,virtualHeightKm'] },
};

const nowUtcInputValue = () => DateTime.utc().startOf('minute').toFormat("yyyy-MM-dd'T'HH:mm");

/** The `datetime-local` value read as UTC, in ISO 8601. */
const toIsoUtc = (value: string): string | undefined => {
  if (!value) return undefined;
  const parsed = DateTime.fromISO(value, { zone: 'utc' });
  return parsed.isValid ? (parsed.toISO({ suppressMilliseconds: true }) ?? undefined) : undefined;
};

const parseOptional = (text: string): number | undefined | null => {
  if (text.trim() === '') return undefined;
  const value = Number(text);
  return Number.isFinite(value) ? value : null;
};

function statusMessage(error: unknown): { title: string; body: string } {
  if (!isApiError(error)) return { title: 'The upload failed', body: String(error) };
  if (error.status === 413)
    return { title: 'The file is too large', body: error.message || 'Upload a smaller file.' };
  if (error.status === 415)
    return {
      title: 'This kind of file is not accepted',
      body: 'Upload a CSV (.csv) or JSON (.json) file with one of the headers shown above.',
    };
  return { title: 'The server refused the file', body: error.message };
}

/** Upload a samples profile or a sounding trace, with progress and every refused row listed. */
export function UploadPanel() {
  const styles = useStyles();
  const navigate = useNavigate();
  const [kind, setKind] = useState<UploadKind>('trace');
  const [file, setFile] = useState<File | null>(null);
  const [name, setName] = useState('');
  const [time, setTime] = useState(nowUtcInputValue);
  const [lat, setLat] = useState('');
  const [lon, setLon] = useState('');
  const [errors, setErrors] = useState<FieldErrors>({});
  const [progress, setProgress] = useState<UploadProgress | null>(null);
  const [done, setDone] = useState<UploadResult | null>(null);

  const upload = useUploadFile({ onProgress: setProgress, onSuccess: setDone });
  const rows = uploadRowErrors(upload.error);
  const serverFields = isApiError(upload.error) ? upload.error.fields : undefined;

  const chooseFile = (chosen: File) => {
    setFile(chosen);
    setErrors((e) => ({ ...e, file: undefined }));
    if (!name.trim()) setName(chosen.name.replace(/\.[^.]+$/, ''));
    upload.reset();
    setDone(null);
  };

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const found: FieldErrors = {};
    const latDeg = parseOptional(lat);
    const lonDeg = parseOptional(lon);
    if (!file) found.file = 'Choose or drop a file first.';
    if (!name.trim()) found.name = 'Give the upload a name.';
    if (time && !toIsoUtc(time)) found.timeUtc = 'Enter a date and time.';
    if (kind === 'trace' && !time) found.timeUtc = 'A sounding needs the time it was observed.';
    if (kind === 'trace' && latDeg === undefined) found.latDeg = 'A sounding needs its latitude.';
    if (kind === 'trace' && lonDeg === undefined) found.lonDeg = 'A sounding needs its longitude.';
    if (latDeg === null || (latDeg !== undefined && Math.abs(latDeg) > 90))
      found.latDeg = 'Latitude is a number from −90 to 90.';
    if (lonDeg === null || (lonDeg !== undefined && Math.abs(lonDeg) > 180))
      found.lonDeg = 'Longitude is a number from −180 to 180.';
    setErrors(found);
    if (Object.values(found).some(Boolean) || !file) return;
    setProgress(null);
    setDone(null);
    upload.mutate({
      kind,
      file,
      name: name.trim(),
      timeUtc: toIsoUtc(time),
      latDeg: latDeg ?? undefined,
      lonDeg: lonDeg ?? undefined,
    });
  };

  const timeKey = kind === 'trace' ? 'observedAtUtc' : 'validAtUtc';
  const message = (field: FieldName) =>
    errors[field] ?? serverFields?.[field === 'timeUtc' ? timeKey : field];
  const fieldProps = (field: FieldName) => ({
    validationMessage: message(field),
    validationState: message(field) ? ('error' as const) : ('none' as const),
  });
  const percent =
    progress?.fraction !== null && progress ? Math.round(progress.fraction * 100) : null;
  const failure = upload.isError ? statusMessage(upload.error) : null;

  return (
    <form className={styles.form} onSubmit={onSubmit} noValidate aria-label="Upload a file">
      <Field label="What the file holds" required>
        <RadioGroup
          value={kind}
          onChange={(_, data) => {
            setKind(data.value as UploadKind);
            upload.reset();
            setDone(null);
          }}
        >
          <Radio value="trace" label="Sounding trace: virtual height by frequency" />
          <Radio
            value="samples"
            label="Profile samples: electron density or plasma frequency by height"
          />
        </RadioGroup>
      </Field>

      <Field label="File" required {...fieldProps('file')}>
        <DropZone
          label="Drop a CSV or JSON file here, or press to choose one"
          hint="Up to a few megabytes; one header row, then one sample per line."
          accept=".csv,.json,text/csv,application/json"
          disabled={upload.isPending}
          file={file}
          onFile={chooseFile}
        />
      </Field>
      <Caption1 className={styles.formats}>
        CSV header row for this kind:{' '}
        {KIND_TEXT[kind].headers.map((header, i) => (
          <span key={header}>
            {i > 0 && ' or '}
            <code className={styles.code}>{header}</code>
          </span>
        ))}
        . JSON files hold the same fields as a list of objects.
      </Caption1>

      <div className={styles.row}>
        <Field label="Name" required {...fieldProps('name')}>
          <Input value={name} onChange={(_, d) => setName(d.value)} />
        </Field>
        <Field
          label={KIND_TEXT[kind].time}
          required={kind === 'trace'}
          hint="Read as UTC."
          {...fieldProps('timeUtc')}
        >
          <Input type="datetime-local" value={time} onChange={(_, d) => setTime(d.value)} />
        </Field>
      </div>
      <div className={styles.row}>
        <Field
          label="Latitude (°, north positive)"
          required={kind === 'trace'}
          {...fieldProps('latDeg')}
        >
          <Input inputMode="decimal" value={lat} onChange={(_, d) => setLat(d.value)} />
        </Field>
        <Field
          label="Longitude (°, east positive)"
          required={kind === 'trace'}
          {...fieldProps('lonDeg')}
        >
          <Input inputMode="decimal" value={lon} onChange={(_, d) => setLon(d.value)} />
        </Field>
      </div>

      {(upload.isPending || progress) && !failure && (
        <Field
          label="Upload progress"
          validationState="none"
          validationMessage={
            upload.isPending
              ? percent === null
                ? 'Sending…'
                : percent < 100
                  ? `${percent} % sent`
                  : 'Sent; the server is checking the file…'
              : 'Done'
          }
        >
          <ProgressBar
            value={percent === null ? undefined : percent / 100}
            thickness="large"
            aria-label="Upload progress"
          />
        </Field>
      )}

      {failure && (
        <MessageBar intent="error" layout="multiline" role="alert">
          <MessageBarBody>
            <MessageBarTitle>{failure.title}</MessageBarTitle>
            {failure.body}
            {rows.length > 0 &&
              ` · ${rows.length === 1 ? 'The refused row is' : `All ${rows.length} refused rows are`} listed below.`}
          </MessageBarBody>
        </MessageBar>
      )}
      {rows.length > 0 && <UploadRowErrors rows={rows} />}

      {done && (
        <MessageBar intent="success" layout="multiline">
          <MessageBarBody>
            <MessageBarTitle>
              {done.kind === 'trace' ? 'Sounding stored' : 'Profile stored'}
            </MessageBarTitle>
            {done.kind === 'trace'
              ? `“${done.row.name}” has ${done.row.pointCount} trace points. Invert it to a true-height profile next.`
              : `“${done.row.name}” is in the library (private until you publish it).`}
          </MessageBarBody>
          <MessageBarActions>
            {done.kind === 'trace' ? (
              <Button
                appearance="primary"
                onClick={() => navigate(paths.profileInvert.getHref(done.row.id))}
              >
                Invert this trace
              </Button>
            ) : (
              <Button
                appearance="primary"
                onClick={() => navigate(paths.profileDetail.getHref(done.row.id))}
              >
                Open the profile
              </Button>
            )}
          </MessageBarActions>
        </MessageBar>
      )}

      <div className={styles.actions}>
        <Button type="submit" appearance="primary" disabled={upload.isPending}>
          {upload.isPending ? 'Uploading…' : 'Upload'}
        </Button>
      </div>
    </form>
  );
}
