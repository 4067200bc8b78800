/**
 * A 24-hour channel plan for a link (SPEC §3 `POST /api/compute/plan`), pure.
 *
 * Per slot (start times from 00:00 UTC of `dateUtc`, every `slotMinutes`):
 *   profile       at the control point (path midpoint), from the caller's `profileAt(startUtc)`
 *   mufMHz[n]     physics/muf.ts `mufPerHops` at the great-circle range (R₀ = 6371 km), n = 1..4,
 *                 minimum elevation 3° (the oblique route's defaults)
 *   owfMHz        0.85 × the highest MUF over the hop counts (common practice, SPEC §9)
 *   usable        channels at or below the highest MUF (no absorption / lowest-usable-frequency
 *                 model in this release, so low channels count as usable)
 *   best          the highest usable channel at or below the OWF (null if none)
 *   modes         physics/homing.ts `computeOblique` at the best channel (modes with group delays)
 * Slots with the same profile (feed, stored, or the model's constant night-time profile) are
 * evaluated once (cached by the profile's JSON).
 */
import { z } from 'zod';
import { parseRequest } from '../compute/schemas.js';
import { pathGeometry, type GeoPoint } from '../geo/great-circle.js';
import { InputError } from '../physics/errors.js';
import { computeOblique, type ObliqueMode } from '../physics/homing.js';
import { mufPerHops } from '../physics/muf.js';
import { buildProfile, type ProfileData } from '../physics/profile.js';

/** OWF = 0.85 × MUF (common practice, SPEC §9). */
export const OWF_FACTOR = 0.85;
export const PLAN_MAX_HOPS = 4;
export const PLAN_MIN_ELEVATION_DEG = 3;
export const PLAN_SLOT_MINUTES = [15, 30, 60] as const;
export const CHANNEL_MIN_KHZ = 3000;
export const CHANNEL_MAX_KHZ = 30000;
export const MAX_CHANNELS = 50;
const KHZ_PER_MHZ = 1000;
const MS_PER_MINUTE = 60_000;
const MINUTES_PER_DAY = 1440;

const point = z.strictObject({
  latDeg: z.number().min(-90, 'must be from -90 to 90').max(90, 'must be from -90 to 90'),
  lonDeg: z.number().min(-180, 'must be from -180 to 180').max(180, 'must be from -180 to 180'),
});

/** One channel [kHz]: an integer from 3000 to 30000. */
export const channelKHzSchema = z
  .number()
  .int('must be an integer number of kHz')
  .min(CHANNEL_MIN_KHZ, `must be from ${CHANNEL_MIN_KHZ} to ${CHANNEL_MAX_KHZ} kHz`)
  .max(CHANNEL_MAX_KHZ, `must be from ${CHANNEL_MIN_KHZ} to ${CHANNEL_MAX_KHZ} kHz`);

export const channelsKHzSchema = z
  .array(channelKHzSchema)
  .min(1, `give 1 to ${MAX_CHANNELS} channels`)
  .max(MAX_CHANNELS, `give 1 to ${MAX_CHANNELS} channels`);

/** `YYYY-MM-DD`, a real calendar date. */
export const dateUtcSchema = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'must be an ISO date YYYY-MM-DD')
  .refine((s) => {
    const d = new Date(`${s}T00:00:00Z`);
    return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === s;
  }, 'must be a real calendar date');

export const planProfileSourceSchema = z.union([
  z.literal('model'),
  z.literal('feed'),
  z.strictObject({ profileId: z.number().int().positive() }),
]);
export type PlanProfileSource = z.infer<typeof planProfileSourceSchema>;

export const planRequestSchema = z
  .strictObject({
    linkId: z.number().int().positive().optional(),
    from: point.optional(),
    to: point.optional(),
    dateUtc: dateUtcSchema,
    channelsKHz: channelsKHzSchema,
    profileSource: planProfileSourceSchema,
    slotMinutes: z
      .union([z.literal(15), z.literal(30), z.literal(60)], { error: 'must be 15, 30 or 60' })
      .default(60),
  })
  .superRefine((b, ctx) => {
    if (b.linkId === undefined && (b.from === undefined || b.to === undefined)) {
      for (const key of ['from', 'to'] as const) {
        if (b[key] === undefined) {
          ctx.addIssue({ code: 'custom', path: [key], message: 'give linkId, or from and to' });
        }
      }
    }
    if (b.linkId !== undefined && (b.from !== undefined || b.to !== undefined)) {
      ctx.addIssue({
        code: 'custom',
        path: ['linkId'],
        message: 'give linkId or from/to, not both',
      });
    }
  });
export type PlanRequest = z.infer<typeof planRequestSchema>;

/** Parses a plan body (throws InputError naming the field → 400). */
export function parsePlanRequest(body: unknown): PlanRequest {
  return parseRequest(planRequestSchema, body);
}

export interface PlanMode {
  label: string;
  hops: number;
  layer: string;
  ray: 'low' | 'high';
  elevationDeg: number;
  groupDelayMs: number;
  groupPathKm: number;
}

export interface PlanSlot {
  startUtc: string;
  mufMHz: Record<string, number | null>;
  owfMHz: number | null;
  usableChannelsKHz: number[];
  bestChannelKHz: number | null;
  modes: PlanMode[];
}

export interface PlanResponse {
  slots: PlanSlot[];
}

export interface PlanInput {
  from: GeoPoint;
  to: GeoPoint;
  dateUtc: string;
  channelsKHz: number[];
  slotMinutes: number;
  /**
   * The profile at the control point for a slot (slots with equal profiles are evaluated once).
   */
  profileAt: (startUtc: Date, controlPoint: GeoPoint) => ProfileData;
}

/** Slot start times of a UTC day. */
export function slotStarts(dateUtc: string, slotMinutes: number): Date[] {
  const day0 = Date.parse(`${dateUtc}T00:00:00Z`);
  const n = Math.round(MINUTES_PER_DAY / slotMinutes);
  return Array.from({ length: n }, (_, i) => new Date(day0 + i * slotMinutes * MS_PER_MINUTE));
}

/** MUF, OWF, usable and best channel for one profile at one range. */
export function evaluateChannels(
  data: ProfileData,
  groundRangeKm: number,
  channelsKHz: readonly number[],
): Omit<PlanSlot, 'startUtc'> {
  const profile = buildProfile(data);
  const mufMHz = mufPerHops(
    profile,
    groundRangeKm,
    PLAN_MAX_HOPS,
    PLAN_MIN_ELEVATION_DEG,
    'spherical',
  );
  const mufs = Object.values(mufMHz).filter((m): m is number => m !== null);
  const maxMufMHz = mufs.length ? Math.max(...mufs) : null;
  const owfMHz = maxMufMHz === null ? null : OWF_FACTOR * maxMufMHz;
  const sorted = [...new Set(channelsKHz)].sort((a, b) => a - b);
  const usableChannelsKHz =
    maxMufMHz === null ? [] : sorted.filter((c) => c / KHZ_PER_MHZ <= maxMufMHz);
  const atOrBelowOwf =
    owfMHz === null ? [] : usableChannelsKHz.filter((c) => c / KHZ_PER_MHZ <= owfMHz);
  const bestChannelKHz = atOrBelowOwf.length ? atOrBelowOwf[atOrBelowOwf.length - 1] : null;
  let modes: PlanMode[] = [];
  if (bestChannelKHz !== null) {
    const oblique = computeOblique(profile, {
      frequencyMHz: bestChannelKHz / KHZ_PER_MHZ,
      groundRangeKm,
      maxHops: PLAN_MAX_HOPS,
      minElevationDeg: PLAN_MIN_ELEVATION_DEG,
      earth: 'spherical',
      mufs: false,
      includeRayPath: false,
    });
    modes = oblique.modes.map(toPlanMode);
  }
  return { mufMHz, owfMHz, usableChannelsKHz, bestChannelKHz, modes };
}

function toPlanMode(m: ObliqueMode): PlanMode {
  return {
    label: m.label,
    hops: m.hops,
    layer: m.layer,
    ray: m.ray,
    elevationDeg: m.elevationDeg,
    groupDelayMs: m.groupDelayMs,
    groupPathKm: m.groupPathKm,
  };
}

/** The plan of SPEC §3 for one path. */
export function computePlan(input: PlanInput): PlanResponse {
  const geometry = pathGeometry(input.from, input.to);
  const groundRangeKm = geometry.distanceKm;
  if (!(groundRangeKm >= 1)) {
    throw new InputError('to: must be at least 1 km from the other end of the path', {
      to: 'must be at least 1 km from the other end of the path',
    });
  }
  const cache = new Map<string, Omit<PlanSlot, 'startUtc'>>();
  const slots = slotStarts(input.dateUtc, input.slotMinutes).map((start) => {
    const data = input.profileAt(start, geometry.midpoint);
    const key = JSON.stringify(data);
    let result = cache.get(key);
    if (!result) {
      result = evaluateChannels(data, groundRangeKm, input.channelsKHz);
      cache.set(key, result);
    }
    return { startUtc: start.toISOString(), ...result };
  });
  return { slots };
}
