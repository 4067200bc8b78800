/**
 * Request bodies of the stations/links/studies routes that the API validates with zod (the client
 * can reuse them for its forms). Paths in errors follow formatIssuePath: `frequenciesMHz[0]`.
 */
import { z } from 'zod';
import { profileInputSchema } from '../compute/schemas.js';

/** ISO 8601 date-time with an explicit zone (`Z` or ±hh:mm), so UTC is never guessed. */
export const ISO_DATE_TIME_WITH_ZONE =
  /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d{1,9})?)?(Z|[+-]\d{2}:?\d{2})$/;

export const isoUtcSchema = z
  .string()
  .regex(
    ISO_DATE_TIME_WITH_ZONE,
    'must be an ISO 8601 date-time with a zone, e.g. 2026-03-18T13:00:00Z',
  )
  .refine((s) => !Number.isNaN(Date.parse(s)), 'is not a valid date-time');

export const studyProfileSourceSchema = z.discriminatedUnion('kind', [
  z.strictObject({
    kind: z.literal('reference'),
    key: z.string().regex(/^[a-z0-9][a-z0-9-]{0,63}$/, 'must be a reference profile key'),
  }),
  z.strictObject({ kind: z.literal('inline'), profile: profileInputSchema }),
  z.strictObject({ kind: z.literal('library'), id: z.number().int().positive() }),
]);

/** Study frequencies: HF and a little either side (1–50 MHz), 1–200 of them. */
export const STUDY_FREQUENCY_MIN_MHZ = 1;
export const STUDY_FREQUENCY_MAX_MHZ = 50;
export const STUDY_MAX_FREQUENCIES = 200;

export const createStudyRequestSchema = z.strictObject({
  linkId: z.number().int().positive(),
  atUtc: isoUtcSchema,
  name: z.string().trim().min(1).max(80).optional(),
  profileSource: studyProfileSourceSchema,
  frequenciesMHz: z
    .array(z.number().min(STUDY_FREQUENCY_MIN_MHZ).max(STUDY_FREQUENCY_MAX_MHZ))
    .min(1)
    .max(STUDY_MAX_FREQUENCIES),
  mode: z.literal('oblique').optional(),
});

export const updateStudyRequestSchema = z.strictObject({
  name: z.string().trim().min(1).max(80).nullable().optional(),
});

export type CreateStudyRequest = z.infer<typeof createStudyRequestSchema>;
export type UpdateStudyRequest = z.infer<typeof updateStudyRequestSchema>;
