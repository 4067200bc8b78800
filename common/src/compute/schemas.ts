/**
 * Request bodies of the compute routes (SPEC §3), as zod schemas shared by the API, the client
 * and the batch CLI. Objects are strict (unknown keys are errors); numbers must be finite (zod 4
 * rejects NaN and ±Infinity for z.number()). Semantic profile checks that need the whole list
 * (strictly increasing heights, duplicate names, a quasi-parabolic layer's geometry) are made by
 * validateProfile/buildProfile in physics/profile.ts.
 */
import { z } from 'zod';
import { InputError } from '../physics/errors.js';

const MAX_HEIGHT_KM = 5000;

const layerSchema = z
  .strictObject({
    name: z.string().trim().min(1).max(32),
    shape: z.enum(['chapman', 'parabolic', 'quasiParabolic']),
    criticalFrequencyMHz: z.number().gt(0).max(100),
    peakHeightKm: z.number().gt(0).lt(MAX_HEIGHT_KM),
    semiThicknessKm: z.number().gt(0).lt(2000).optional(),
    scaleHeightKm: z.number().gt(0).lt(1000).optional(),
  })
  .superRefine((layer, ctx) => {
    if (layer.shape === 'chapman' && layer.scaleHeightKm === undefined) {
      ctx.addIssue({
        code: 'custom',
        path: ['scaleHeightKm'],
        message: 'is required for a chapman layer',
      });
    }
    if (layer.shape !== 'chapman' && layer.semiThicknessKm === undefined) {
      ctx.addIssue({
        code: 'custom',
        path: ['semiThicknessKm'],
        message: `is required for a ${layer.shape} layer`,
      });
    }
  });

const sampleSchema = z
  .strictObject({
    heightKm: z.number().min(0).lt(MAX_HEIGHT_KM),
    electronDensityPerM3: z.number().min(0).lt(1e16).optional(),
    plasmaFrequencyMHz: z.number().min(0).lt(100).optional(),
  })
  .superRefine((sample, ctx) => {
    if ((sample.electronDensityPerM3 === undefined) === (sample.plasmaFrequencyMHz === undefined)) {
      ctx.addIssue({
        code: 'custom',
        path: [],
        message: 'give exactly one of electronDensityPerM3 or plasmaFrequencyMHz',
      });
    }
  });

/** ProfileInput = { id } (a stored profile) | { layers } | { samples }. */
export const profileInputSchema = z
  .strictObject({
    id: z.number().int().positive().optional(),
    layers: z.array(layerSchema).min(1).max(20).optional(),
    samples: z.array(sampleSchema).min(2).max(20000).optional(),
  })
  .superRefine((profile, ctx) => {
    const given = ['id', 'layers', 'samples'].filter(
      (k) => profile[k as keyof typeof profile] !== undefined,
    );
    if (given.length !== 1) {
      ctx.addIssue({
        code: 'custom',
        path: [],
        message: 'give exactly one of id, layers or samples',
      });
    }
  });

const earthRadiusKm = z.number().min(1000).max(100_000);

export const plasmaRequestSchema = z
  .strictObject({
    electronDensityPerM3: z.number().min(0).max(1e20).optional(),
    plasmaFrequencyMHz: z.number().min(0).max(100_000).optional(),
    frequencyMHz: z.number().gt(0).max(100_000),
  })
  .superRefine((body, ctx) => {
    if ((body.electronDensityPerM3 === undefined) === (body.plasmaFrequencyMHz === undefined)) {
      ctx.addIssue({
        code: 'custom',
        path: [],
        message: 'give exactly one of electronDensityPerM3 or plasmaFrequencyMHz',
      });
    }
  });

export const verticalRequestSchema = z.strictObject({
  profile: profileInputSchema,
  frequenciesMHz: z.array(z.number().min(0.1).max(100)).min(1).max(2000),
  /** Extension: R₀ of quasi-parabolic layers (default 6371 km). */
  earthRadiusKm: earthRadiusKm.optional(),
});

export const obliqueRequestSchema = z.strictObject({
  profile: profileInputSchema,
  frequencyMHz: z.number().min(0.1).max(100),
  groundRangeKm: z.number().gt(0).max(20_000),
  maxHops: z.number().int().min(1).max(6).default(4),
  minElevationDeg: z.number().min(0).lt(90).default(3),
  earth: z.enum(['spherical', 'flat']).default('spherical'),
  earthRadiusKm: earthRadiusKm.optional(),
  mufs: z.boolean().default(true),
  includeRayPath: z.boolean().default(false),
});

export const slantRequestSchema = z.strictObject({
  profile: profileInputSchema,
  frequencyMHz: z.number().min(0.1).max(100_000),
  elevationDeg: z.number().min(0).max(90),
  topHeightKm: z.number().gt(0).max(50_000).default(2000),
  earthRadiusKm: earthRadiusKm.optional(),
});

export const invertRequestSchema = z.strictObject({
  trace: z
    .array(
      z.strictObject({
        frequencyMHz: z.number().min(0.1).max(100),
        virtualHeightKm: z.number().gt(0).lt(MAX_HEIGHT_KM),
      }),
    )
    .min(5)
    .max(5000)
    .superRefine((trace, ctx) => {
      for (let i = 1; i < trace.length; i++) {
        if (!(trace[i].frequencyMHz > trace[i - 1].frequencyMHz)) {
          ctx.addIssue({
            code: 'custom',
            path: [i, 'frequencyMHz'],
            message: 'frequencies must be strictly ascending',
          });
          return;
        }
      }
    }),
});

export type ProfileInput = z.infer<typeof profileInputSchema>;
export type PlasmaRequest = z.infer<typeof plasmaRequestSchema>;
export type VerticalRequest = z.infer<typeof verticalRequestSchema>;
export type ObliqueRequest = z.infer<typeof obliqueRequestSchema>;
/** The oblique request as sent (defaults not yet applied). */
export type ObliqueRequestInput = z.input<typeof obliqueRequestSchema>;
export type SlantRequest = z.infer<typeof slantRequestSchema>;
export type InvertRequest = z.infer<typeof invertRequestSchema>;

export const computeRequestSchemas = {
  plasma: plasmaRequestSchema,
  vertical: verticalRequestSchema,
  oblique: obliqueRequestSchema,
  slant: slantRequestSchema,
  invert: invertRequestSchema,
} as const;

export type ComputeRoute = keyof typeof computeRequestSchemas;
export const COMPUTE_ROUTES = Object.keys(computeRequestSchemas) as ComputeRoute[];

/** Dotted path with array indices in brackets: ['profile','layers',1,'name'] → 'profile.layers[1].name'. */
export function formatIssuePath(path: readonly PropertyKey[], prefix = ''): string {
  let out = prefix;
  for (const key of path) {
    if (typeof key === 'number') out += `[${key}]`;
    else out += out === '' ? String(key) : `.${String(key)}`;
  }
  return out === '' ? 'body' : out;
}

/** Turns a ZodError into an InputError whose `fields` are keyed by dotted path; the message names the first field. */
export function zodErrorToInputError(error: z.ZodError, prefix = ''): InputError {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    if (issue.code === 'unrecognized_keys') {
      for (const key of issue.keys)
        fields[formatIssuePath([...issue.path, key], prefix)] ??= 'unknown field';
    } else {
      fields[formatIssuePath(issue.path, prefix)] ??= issue.message;
    }
  }
  const [firstPath, firstReason] = Object.entries(fields)[0] ?? ['body', 'invalid input'];
  return new InputError(`${firstPath}: ${firstReason}`, fields);
}

/** Parses a body with a schema, throwing InputError (→ 400) on failure. */
export function parseRequest<T extends z.ZodType>(schema: T, body: unknown): z.infer<T> {
  const result = schema.safeParse(body);
  if (!result.success) throw zodErrorToInputError(result.error);
  return result.data;
}
