import {
  InputError,
  buildProfile,
  profileInputSchema,
  type LayerInput,
  type LayerShape,
  type Profile,
} from '@hopwise/common';

export type LayerName = 'E' | 'F1' | 'F2';
export const LAYER_NAMES: readonly LayerName[] = ['E', 'F1', 'F2'];

/** One layer of the builder form; numbers are kept as typed so a half-typed value is not lost. */
export interface LayerFormValues {
  enabled: boolean;
  shape: LayerShape;
  criticalFrequencyMHz: string;
  peakHeightKm: string;
  /** Semi-thickness y_m (parabolic, quasi-parabolic) or scale height H (Chapman). */
  thicknessKm: string;
}

export type LayerForm = Record<LayerName, LayerFormValues>;
export type LayerField = 'shape' | 'criticalFrequencyMHz' | 'peakHeightKm' | 'thicknessKm';
export type LayerFormErrors = Partial<Record<LayerName, Partial<Record<LayerField, string>>>>;

/**
 * Illustrative defaults. E at 110 km with a 20 km semi-thickness follows ITU-R P.533; its critical
 * frequency (3 MHz) and the F1 and F2 values are typical daytime mid-latitude numbers (from memory,
 * not a measurement).
 */
export const DEFAULT_LAYER_FORM: LayerForm = {
  E: {
    enabled: true,
    shape: 'parabolic',
    criticalFrequencyMHz: '3',
    peakHeightKm: '110',
    thicknessKm: '20',
  },
  F1: {
    enabled: true,
    shape: 'parabolic',
    criticalFrequencyMHz: '3.8',
    peakHeightKm: '200',
    thicknessKm: '40',
  },
  F2: {
    enabled: true,
    shape: 'chapman',
    criticalFrequencyMHz: '8',
    peakHeightKm: '300',
    thicknessKm: '55',
  },
};

export const SHAPE_LABELS: Record<LayerShape, string> = {
  parabolic: 'Parabolic',
  quasiParabolic: 'Quasi-parabolic',
  chapman: 'α-Chapman',
};

/** Which thickness a shape takes: the scale height H for Chapman, else the semi-thickness y_m. */
export const thicknessKey = (shape: LayerShape): 'scaleHeightKm' | 'semiThicknessKm' =>
  shape === 'chapman' ? 'scaleHeightKm' : 'semiThicknessKm';

const FIELD_OF_KEY: Record<string, LayerField> = {
  shape: 'shape',
  criticalFrequencyMHz: 'criticalFrequencyMHz',
  peakHeightKm: 'peakHeightKm',
  semiThicknessKm: 'thicknessKm',
  scaleHeightKm: 'thicknessKm',
};

function parseNumber(text: string): number | null {
  const trimmed = text.trim();
  if (trimmed === '') return null;
  const value = Number(trimmed);
  return Number.isFinite(value) ? value : null;
}

export interface LayerFormResult {
  /** The layers when every enabled one is valid, else null. */
  layers: LayerInput[] | null;
  /** The built profile (for the live preview), when valid. */
  profile: Profile | null;
  errors: LayerFormErrors;
  /** A message about the form as a whole (e.g. no layer enabled). */
  formError?: string;
}

/**
 * Turns the form into `layers` and checks them with the shared schema and the physics core's
 * validation (the same checks the API makes), keyed back to the layer and field they concern.
 */
export function readLayerForm(form: LayerForm): LayerFormResult {
  const errors: LayerFormErrors = {};
  const setError = (name: LayerName, field: LayerField, message: string) => {
    errors[name] = { ...errors[name], [field]: errors[name]?.[field] ?? message };
  };
  const enabled = LAYER_NAMES.filter((name) => form[name].enabled);
  if (enabled.length === 0) {
    return { layers: null, profile: null, errors, formError: 'Enable at least one layer.' };
  }

  const layers: LayerInput[] = [];
  for (const name of enabled) {
    const values = form[name];
    const fc = parseNumber(values.criticalFrequencyMHz);
    const hm = parseNumber(values.peakHeightKm);
    const thickness = parseNumber(values.thicknessKm);
    if (fc === null) setError(name, 'criticalFrequencyMHz', 'Enter a number in MHz.');
    if (hm === null) setError(name, 'peakHeightKm', 'Enter a number in km.');
    if (thickness === null) setError(name, 'thicknessKm', 'Enter a number in km.');
    if (fc === null || hm === null || thickness === null) continue;
    layers.push({
      name,
      shape: values.shape,
      criticalFrequencyMHz: fc,
      peakHeightKm: hm,
      [thicknessKey(values.shape)]: thickness,
    });
  }
  if (Object.keys(errors).length > 0) return { layers: null, profile: null, errors };

  const parsed = profileInputSchema.safeParse({ layers });
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const [root, index, key] = issue.path;
      if (root !== 'layers' || typeof index !== 'number') continue;
      const field = FIELD_OF_KEY[String(key)];
      if (field) setError(enabled[index], field, issue.message);
    }
    return { layers: null, profile: null, errors };
  }

  try {
    const profile = buildProfile({ layers });
    return { layers, profile, errors };
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    let placed = false;
    for (const [path, reason] of Object.entries(error.fields)) {
      const match = /layers\[(\d+)\]\.(\w+)/.exec(path);
      const field = match ? FIELD_OF_KEY[match[2]] : undefined;
      if (match && field) {
        setError(enabled[Number(match[1])], field, reason);
        placed = true;
      }
    }
    return {
      layers: null,
      profile: null,
      errors,
      formError: placed ? undefined : error.message,
    };
  }
}
