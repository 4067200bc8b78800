/**
 * Electron-density profiles N(h) (SPEC §2.1).
 *
 * Layer shapes (densities of a `layers` profile are summed):
 *   α-Chapman       N = N_m·exp(½(1 − z − e^(−z))),  z = (h − h_m)/H          (Davies 1990, §2; Chapman 1931)
 *   parabolic       N = N_m·(1 − ((h − h_m)/y_m)²),   |h − h_m| ≤ y_m          (Davies 1990; Budden 1985)
 *   quasi-parabolic N = N_m·(1 − ((r − r_m)/y_m)²·(r_b/r)²),  r_b < r < r_m·r_b/(r_b − y_m)
 *                   with r = R₀ + h, r_m = R₀ + h_m, r_b = r_m − y_m  (Croft & Hoogasian, Radio Sci. 3, 1968)
 *   N_m = f_c²/(e²/(4π²ε₀mₑ)) from the critical frequency.
 * `samples` profiles are linear in N between samples and 0 outside the sampled range.
 *
 * A Chapman layer is treated as 0 where N < 1e-12·N_m (z below ≈ −4.1 or above ≈ +56.3), so every
 * profile has a finite [bottomKm, topKm]; a Chapman tail reaching below the ground is cut at 0 km.
 */
import { EARTH_RADIUS_KM } from './constants.js';
import { ProfileInputError } from './errors.js';
import { electronDensityFromPlasmaFrequencyMHz, plasmaFrequencyMHz } from './plasma.js';
import { brentRoot, goldenMaximum } from './quadrature.js';

export type LayerShape = 'chapman' | 'parabolic' | 'quasiParabolic';
export const LAYER_SHAPES: readonly LayerShape[] = ['chapman', 'parabolic', 'quasiParabolic'];

export interface LayerInput {
  name: string;
  shape: LayerShape;
  criticalFrequencyMHz: number;
  peakHeightKm: number;
  semiThicknessKm?: number;
  scaleHeightKm?: number;
}
export type SampleInput =
  | { heightKm: number; electronDensityPerM3: number }
  | { heightKm: number; plasmaFrequencyMHz: number };
export type ProfileData = { layers: LayerInput[] } | { samples: SampleInput[] };

export interface ProfilePeak {
  /** Layer name (layers) or 'peak1', 'peak2', … from the ground up (samples). */
  name: string;
  /** The layer's own peak height (layers) / the local maximum (samples). */
  heightKm: number;
  /** Plasma frequency of the summed profile at heightKm. */
  plasmaFrequencyMHz: number;
  /** Summed electron density at heightKm. */
  electronDensityPerM3: number;
}

export interface Profile {
  readonly kind: 'layers' | 'samples';
  /** R₀, default 6371 km (also the R₀ of quasi-parabolic layers). */
  readonly earthRadiusKm: number;
  /** Summed N(h) ≥ 0; exactly 0 outside [bottomKm, topKm]. */
  electronDensityPerM3(heightKm: number): number;
  plasmaFrequencyMHz(heightKm: number): number;
  /**
   * N(h) − N(h − depthKm), depthKm ≥ 0, computed per layer in a form free of cancellation for
   * small depths (used next to a turning point, where 1 − X is the small difference of two
   * nearly equal densities).
   */
  densityDropPerM3(heightKm: number, depthKm: number): number;
  /** Lowest height with N > 0 (for samples: the last zero sample below the first positive one). */
  readonly bottomKm: number;
  readonly topKm: number;
  /** Ascending heights in [bottomKm, topKm], both ends included, where N or dN/dh is not smooth. */
  readonly breakpointsKm: readonly number[];
  /**
   * Ascending heights in [bottomKm, topKm] (breakpoints plus the local maxima and minima of N,
   * found on a grid of ≤ 1 km and refined by golden section) between which N(h) is monotonic.
   */
  readonly monotonicBreaksKm: readonly number[];
  /** Ascending by heightKm. */
  readonly peaks: readonly ProfilePeak[];
  readonly maxPlasmaFrequencyMHz: number;
  readonly maxPlasmaFrequencyHeightKm: number;
  readonly maxElectronDensityPerM3: number;
  /** The samples (heights and densities) of a `samples` profile; undefined for layers. */
  readonly samples?: { readonly heightsKm: Float64Array; readonly densitiesPerM3: Float64Array };
}

/** Fraction of N_m below which a Chapman layer is treated as 0 (documented cut-off). */
export const CHAPMAN_CUTOFF_FRACTION = 1e-12;
const MAX_HEIGHT_KM = 5000;
const MAX_LAYERS = 20;
const MAX_SAMPLES = 20000;

// z at which ½(1 − z − e^(−z)) = ln(cutoff), below and above the peak.
const chapmanLog = (z: number) => 0.5 * (1 - z - Math.exp(-z)) - Math.log(CHAPMAN_CUTOFF_FRACTION);
const CHAPMAN_Z_LOW = brentRoot(chapmanLog, -20, 0) as number;
const CHAPMAN_Z_HIGH = brentRoot(chapmanLog, 0, 200) as number;

export function chapmanDensity(
  heightKm: number,
  nmPerM3: number,
  peakKm: number,
  scaleKm: number,
): number {
  const z = (heightKm - peakKm) / scaleKm;
  if (z < CHAPMAN_Z_LOW || z > CHAPMAN_Z_HIGH) return 0;
  return nmPerM3 * Math.exp(0.5 * (1 - z - Math.exp(-z)));
}

/** Chapman N(h) − N(h − d): −N(h)·expm1(g(h − d) − g(h)), g = ½(1 − z − e^(−z)). */
export function chapmanDensityDrop(
  heightKm: number,
  depthKm: number,
  nmPerM3: number,
  peakKm: number,
  scaleKm: number,
): number {
  const z = (heightKm - peakKm) / scaleKm;
  const zBelow = z - depthKm / scaleKm;
  if (z < CHAPMAN_Z_LOW || z > CHAPMAN_Z_HIGH || zBelow < CHAPMAN_Z_LOW) {
    return (
      chapmanDensity(heightKm, nmPerM3, peakKm, scaleKm) -
      chapmanDensity(heightKm - depthKm, nmPerM3, peakKm, scaleKm)
    );
  }
  const s = depthKm / scaleKm;
  const dg = 0.5 * (s - Math.exp(-z) * Math.expm1(s)); // g(z − s) − g(z)
  return -nmPerM3 * Math.exp(0.5 * (1 - z - Math.exp(-z))) * Math.expm1(dg);
}

export function parabolicDensity(
  heightKm: number,
  nmPerM3: number,
  peakKm: number,
  semiKm: number,
): number {
  const u = (heightKm - peakKm) / semiKm;
  return u <= -1 || u >= 1 ? 0 : nmPerM3 * (1 - u * u);
}

/** Parabolic N(h) − N(h − d) = N_m·(d/y_m)·(u₁ + u₂) with u₂ = u₁ − d/y_m. */
export function parabolicDensityDrop(
  heightKm: number,
  depthKm: number,
  nmPerM3: number,
  peakKm: number,
  semiKm: number,
): number {
  const u1 = (heightKm - peakKm) / semiKm;
  const u2 = u1 - depthKm / semiKm;
  if (u1 <= -1 || u1 >= 1 || u2 <= -1 || u2 >= 1) {
    return (
      parabolicDensity(heightKm, nmPerM3, peakKm, semiKm) -
      parabolicDensity(heightKm - depthKm, nmPerM3, peakKm, semiKm)
    );
  }
  return -nmPerM3 * (depthKm / semiKm) * (u1 + u2);
}

export function quasiParabolicDensity(
  heightKm: number,
  nmPerM3: number,
  peakKm: number,
  semiKm: number,
  earthRadiusKm: number,
): number {
  const r = earthRadiusKm + heightKm;
  const rm = earthRadiusKm + peakKm;
  const rb = rm - semiKm;
  if (r <= rb || r >= (rm * rb) / (rb - semiKm)) return 0;
  const w = ((r - rm) / semiKm) * (rb / r);
  return nmPerM3 * (1 - w * w);
}

/** Quasi-parabolic N(h) − N(h − d), with w = (r_b/y_m)(1 − r_m/r): w₁ − w₂ = (r_b r_m/y_m)·d/(r₁r₂). */
export function quasiParabolicDensityDrop(
  heightKm: number,
  depthKm: number,
  nmPerM3: number,
  peakKm: number,
  semiKm: number,
  earthRadiusKm: number,
): number {
  const r1 = earthRadiusKm + heightKm;
  const r2 = r1 - depthKm;
  const rm = earthRadiusKm + peakKm;
  const rb = rm - semiKm;
  const rt = (rm * rb) / (rb - semiKm);
  if (r1 <= rb || r1 >= rt || r2 <= rb || r2 >= rt) {
    return (
      quasiParabolicDensity(heightKm, nmPerM3, peakKm, semiKm, earthRadiusKm) -
      quasiParabolicDensity(heightKm - depthKm, nmPerM3, peakKm, semiKm, earthRadiusKm)
    );
  }
  const w1 = (rb / semiKm) * (1 - rm / r1);
  const w2 = (rb / semiKm) * (1 - rm / r2);
  const dw = ((rb * rm) / semiKm) * (depthKm / (r1 * r2));
  return -nmPerM3 * dw * (w1 + w2);
}

// ---------------------------------------------------------------------------------------------
// Validation

type Fields = Record<string, string>;

function fail(fields: Fields): never {
  const [path, reason] = Object.entries(fields)[0];
  throw new ProfileInputError(`${path}: ${reason}`, fields);
}

const isRecord = (v: unknown): v is Record<string, unknown> =>
  typeof v === 'object' && v !== null && !Array.isArray(v);
const isFiniteNumber = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);

function checkNumber(
  obj: Record<string, unknown>,
  key: string,
  path: string,
  { min, max, minExclusive = false }: { min: number; max?: number; minExclusive?: boolean },
): number {
  const v = obj[key];
  const at = `${path}.${key}`;
  if (v === undefined) fail({ [at]: 'is required' });
  if (!isFiniteNumber(v)) fail({ [at]: 'must be a finite number' });
  if (minExclusive ? v <= min : v < min)
    fail({ [at]: `must be ${minExclusive ? '>' : '≥'} ${min}` });
  if (max !== undefined && v >= max) fail({ [at]: `must be < ${max}` });
  return v;
}

/**
 * Checks a profile given as `{ layers }` or `{ samples }` and returns it typed; throws
 * ProfileInputError with the offending path (e.g. `profile.layers[1].semiThicknessKm`).
 * Fields a shape does not use (scaleHeightKm on a parabolic layer, …) are ignored.
 */
export function validateProfile(input: unknown, path = 'profile'): ProfileData {
  if (!isRecord(input)) fail({ [path]: 'must be an object with either layers or samples' });
  const hasLayers = input.layers !== undefined;
  const hasSamples = input.samples !== undefined;
  if (hasLayers === hasSamples) {
    if (input.id !== undefined) fail({ [`${path}.id`]: 'a stored profile must be resolved first' });
    fail({ [path]: 'give exactly one of layers or samples' });
  }
  return hasLayers
    ? validateLayers(input.layers, `${path}.layers`)
    : validateSamples(input.samples, `${path}.samples`);
}

function validateLayers(raw: unknown, path: string): { layers: LayerInput[] } {
  if (!Array.isArray(raw)) fail({ [path]: 'must be an array of layers' });
  if (raw.length === 0) fail({ [path]: 'must contain at least one layer' });
  if (raw.length > MAX_LAYERS) fail({ [path]: `at most ${MAX_LAYERS} layers` });
  const names = new Set<string>();
  const layers = raw.map((item, i): LayerInput => {
    const at = `${path}[${i}]`;
    if (!isRecord(item)) fail({ [at]: 'must be an object' });
    const name = item.name;
    if (typeof name !== 'string' || name.trim() === '')
      fail({ [`${at}.name`]: 'must be a non-empty string' });
    if (name.length > 32) fail({ [`${at}.name`]: 'at most 32 characters' });
    if (names.has(name)) fail({ [`${at}.name`]: `duplicate layer name '${name}'` });
    names.add(name);
    const shape = item.shape;
    if (typeof shape !== 'string' || !(LAYER_SHAPES as readonly string[]).includes(shape)) {
      fail({ [`${at}.shape`]: `must be one of ${LAYER_SHAPES.join(', ')}` });
    }
    const criticalFrequencyMHz = checkNumber(item, 'criticalFrequencyMHz', at, {
      min: 0,
      max: 100,
      minExclusive: true,
    });
    const peakHeightKm = checkNumber(item, 'peakHeightKm', at, {
      min: 0,
      max: MAX_HEIGHT_KM,
      minExclusive: true,
    });
    const layer: LayerInput = {
      name,
      shape: shape as LayerShape,
      criticalFrequencyMHz,
      peakHeightKm,
    };
    if (shape === 'chapman') {
      layer.scaleHeightKm = checkNumber(item, 'scaleHeightKm', at, {
        min: 0,
        max: 1000,
        minExclusive: true,
      });
    } else {
      const semi = checkNumber(item, 'semiThicknessKm', at, {
        min: 0,
        max: 2000,
        minExclusive: true,
      });
      if (semi > peakHeightKm) {
        fail({
          [`${at}.semiThicknessKm`]:
            'must not exceed peakHeightKm (the layer base would be below the ground)',
        });
      }
      layer.semiThicknessKm = semi;
    }
    return layer;
  });
  return { layers };
}

function validateSamples(raw: unknown, path: string): { samples: SampleInput[] } {
  if (!Array.isArray(raw)) fail({ [path]: 'must be an array of samples' });
  if (raw.length < 2) fail({ [path]: 'must contain at least 2 samples' });
  if (raw.length > MAX_SAMPLES) fail({ [path]: `at most ${MAX_SAMPLES} samples` });
  let previousKm = -Infinity;
  let anyPositive = false;
  const samples = raw.map((item, i): SampleInput => {
    const at = `${path}[${i}]`;
    if (!isRecord(item)) fail({ [at]: 'must be an object' });
    const heightKm = checkNumber(item, 'heightKm', at, { min: 0, max: MAX_HEIGHT_KM });
    if (heightKm <= previousKm) fail({ [`${at}.heightKm`]: 'heights must be strictly increasing' });
    previousKm = heightKm;
    const hasN = item.electronDensityPerM3 !== undefined;
    const hasF = item.plasmaFrequencyMHz !== undefined;
    if (hasN === hasF)
      fail({ [at]: 'give exactly one of electronDensityPerM3 or plasmaFrequencyMHz' });
    if (hasN) {
      const n = checkNumber(item, 'electronDensityPerM3', at, { min: 0, max: 1e16 });
      anyPositive ||= n > 0;
      return { heightKm, electronDensityPerM3: n };
    }
    const f = checkNumber(item, 'plasmaFrequencyMHz', at, { min: 0, max: 100 });
    anyPositive ||= f > 0;
    return { heightKm, plasmaFrequencyMHz: f };
  });
  if (!anyPositive) fail({ [path]: 'at least one sample must have a positive density' });
  return { samples };
}

// ---------------------------------------------------------------------------------------------
// Construction

const sampleDensity = (s: SampleInput): number =>
  'electronDensityPerM3' in s
    ? s.electronDensityPerM3
    : electronDensityFromPlasmaFrequencyMHz(s.plasmaFrequencyMHz);

const sortedUnique = (values: number[]): number[] =>
  [...values].sort((a, b) => a - b).filter((v, i, arr) => i === 0 || v !== arr[i - 1]);

/** Builds the evaluable profile; validates first (throws ProfileInputError). */
export function buildProfile(data: ProfileData, options: { earthRadiusKm?: number } = {}): Profile {
  const earthRadiusKm = options.earthRadiusKm ?? EARTH_RADIUS_KM;
  if (!(Number.isFinite(earthRadiusKm) && earthRadiusKm > 0)) {
    throw new ProfileInputError('earthRadiusKm: must be a positive number', {
      earthRadiusKm: 'must be a positive number',
    });
  }
  const checked = validateProfile(data);
  return 'layers' in checked
    ? buildLayers(checked.layers, earthRadiusKm)
    : buildSamples(checked.samples, earthRadiusKm);
}

function buildLayers(layers: LayerInput[], earthRadiusKm: number): Profile {
  const parts = layers.map((layer, i) => {
    const nm = electronDensityFromPlasmaFrequencyMHz(layer.criticalFrequencyMHz);
    const hm = layer.peakHeightKm;
    if (layer.shape === 'chapman') {
      const H = layer.scaleHeightKm as number;
      return {
        density: (h: number) => chapmanDensity(h, nm, hm, H),
        drop: (h: number, d: number) => chapmanDensityDrop(h, d, nm, hm, H),
        lowKm: Math.max(0, hm + CHAPMAN_Z_LOW * H),
        highKm: hm + CHAPMAN_Z_HIGH * H,
        scaleKm: H,
      };
    }
    const ym = layer.semiThicknessKm as number;
    if (layer.shape === 'parabolic') {
      return {
        density: (h: number) => parabolicDensity(h, nm, hm, ym),
        drop: (h: number, d: number) => parabolicDensityDrop(h, d, nm, hm, ym),
        lowKm: hm - ym,
        highKm: hm + ym,
        scaleKm: ym,
      };
    }
    const rm = earthRadiusKm + hm;
    const rb = rm - ym;
    if (rb <= ym) {
      const at = `profile.layers[${i}].semiThicknessKm`;
      throw new ProfileInputError(`${at}: quasi-parabolic layer needs y_m < r_b (r_m − y_m)`, {
        [at]: 'quasi-parabolic layer needs y_m < r_m − y_m',
      });
    }
    return {
      density: (h: number) => quasiParabolicDensity(h, nm, hm, ym, earthRadiusKm),
      drop: (h: number, d: number) => quasiParabolicDensityDrop(h, d, nm, hm, ym, earthRadiusKm),
      lowKm: hm - ym,
      highKm: (rm * rb) / (rb - ym) - earthRadiusKm,
      scaleKm: ym,
    };
  });
  const density =
    parts.length === 1
      ? parts[0].density
      : (h: number) => {
          let n = 0;
          for (const p of parts) n += p.density(h);
          return n;
        };
  const drop = (h: number, d: number) => {
    let n = 0;
    for (const p of parts) n += p.drop(h, d);
    return n;
  };
  const bottomKm = Math.min(...parts.map((p) => p.lowKm));
  const topKm = Math.max(...parts.map((p) => p.highKm));
  const breakpointsKm = sortedUnique(parts.flatMap((p) => [p.lowKm, p.highKm]));

  // Local extrema of the summed N on a grid within each smooth segment, refined by golden section.
  const stepKm = Math.min(1, Math.min(...parts.map((p) => p.scaleKm)) / 20);
  const extremaKm: number[] = [];
  for (let s = 0; s + 1 < breakpointsKm.length; s++) {
    const a = breakpointsKm[s];
    const b = breakpointsKm[s + 1];
    const n = Math.max(2, Math.ceil((b - a) / stepKm));
    let prevH = a;
    let prevN = density(a + 1e-9 * (b - a));
    let prevSign = 0;
    for (let k = 1; k <= n; k++) {
      const h = k === n ? b - 1e-9 * (b - a) : a + ((b - a) * k) / n;
      const nh = density(h);
      const sign = Math.sign(nh - prevN);
      if (sign !== 0) {
        if (prevSign !== 0 && sign !== prevSign) {
          // N turned between the previous two grid steps: the extremum lies in [h − 2·step, h].
          const lo = Math.max(a, prevH - (b - a) / n);
          const f = prevSign > 0 ? density : (x: number) => -density(x);
          extremaKm.push(goldenMaximum(f, lo, h, 1e-9));
        }
        prevSign = sign;
      }
      prevH = h;
      prevN = nh;
    }
  }
  const monotonicBreaksKm = sortedUnique([...breakpointsKm, ...extremaKm]);

  let maxN = 0;
  let maxH = bottomKm;
  for (const h of [...monotonicBreaksKm, ...layers.map((l) => l.peakHeightKm)]) {
    const nh = density(h);
    if (nh > maxN) {
      maxN = nh;
      maxH = h;
    }
  }
  const peaks = layers
    .map((l) => {
      const n = density(l.peakHeightKm);
      return {
        name: l.name,
        heightKm: l.peakHeightKm,
        plasmaFrequencyMHz: plasmaFrequencyMHz(n),
        electronDensityPerM3: n,
      };
    })
    .sort((p, q) => p.heightKm - q.heightKm);

  return {
    kind: 'layers',
    earthRadiusKm,
    electronDensityPerM3: (h) => (h < bottomKm || h > topKm ? 0 : density(h)),
    plasmaFrequencyMHz: (h) => plasmaFrequencyMHz(h < bottomKm || h > topKm ? 0 : density(h)),
    densityDropPerM3: (h, d) => {
      const h2 = h - d;
      const inside = (x: number) => x >= bottomKm && x <= topKm;
      if (inside(h) && inside(h2)) return drop(h, d);
      return (inside(h) ? density(h) : 0) - (inside(h2) ? density(h2) : 0);
    },
    bottomKm,
    topKm,
    breakpointsKm,
    monotonicBreaksKm,
    peaks,
    maxPlasmaFrequencyMHz: plasmaFrequencyMHz(maxN),
    maxPlasmaFrequencyHeightKm: maxH,
    maxElectronDensityPerM3: maxN,
  };
}

function buildSamples(samples: SampleInput[], earthRadiusKm: number): Profile {
  const allH = samples.map((s) => s.heightKm);
  const allN = samples.map(sampleDensity);
  // Trim leading and trailing zero samples, keeping one zero at each end as the ramp's foot.
  let first = allN.findIndex((n) => n > 0);
  let last = allN.length - 1 - [...allN].reverse().findIndex((n) => n > 0);
  first = Math.max(0, first - 1);
  last = Math.min(allN.length - 1, last + 1);
  const heightsKm = Float64Array.from(allH.slice(first, last + 1));
  const densitiesPerM3 = Float64Array.from(allN.slice(first, last + 1));
  const count = heightsKm.length;
  const bottomKm = heightsKm[0];
  const topKm = heightsKm[count - 1];

  const density = (h: number): number => {
    if (h < bottomKm || h > topKm) return 0;
    let lo = 0;
    let hi = count - 1;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (heightsKm[mid] <= h) lo = mid;
      else hi = mid;
    }
    const t = (h - heightsKm[lo]) / (heightsKm[hi] - heightsKm[lo]);
    return densitiesPerM3[lo] + t * (densitiesPerM3[hi] - densitiesPerM3[lo]);
  };

  // Local maxima (plateaus count once, at their top end), with zero density beyond both ends.
  const peaks: ProfilePeak[] = [];
  const at = (i: number) => (i < 0 || i >= count ? 0 : densitiesPerM3[i]);
  for (let i = 0; i < count; i++) {
    let j = i;
    while (j + 1 < count && densitiesPerM3[j + 1] === densitiesPerM3[i]) j++;
    if (at(i) > 0 && at(i - 1) < at(i) && at(j + 1) < at(i)) {
      peaks.push({
        name: `peak${peaks.length + 1}`,
        heightKm: heightsKm[j],
        plasmaFrequencyMHz: plasmaFrequencyMHz(densitiesPerM3[j]),
        electronDensityPerM3: densitiesPerM3[j],
      });
    }
    i = j;
  }
  let maxI = 0;
  for (let i = 1; i < count; i++) if (densitiesPerM3[i] > densitiesPerM3[maxI]) maxI = i;

  const breakpointsKm = Array.from(heightsKm);
  return {
    kind: 'samples',
    earthRadiusKm,
    electronDensityPerM3: density,
    plasmaFrequencyMHz: (h) => plasmaFrequencyMHz(density(h)),
    densityDropPerM3: (h, d) => density(h) - density(h - d),
    bottomKm,
    topKm,
    breakpointsKm,
    monotonicBreaksKm: breakpointsKm,
    peaks,
    maxPlasmaFrequencyMHz: plasmaFrequencyMHz(densitiesPerM3[maxI]),
    maxPlasmaFrequencyHeightKm: heightsKm[maxI],
    maxElectronDensityPerM3: densitiesPerM3[maxI],
    samples: { heightsKm, densitiesPerM3 },
  };
}
