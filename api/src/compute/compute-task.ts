import type { ComputeRoute, GeoPoint, ProfileData } from '@hopwise/common';

/**
 * The messages between ComputeService and the compute worker (compute.worker.mjs): one task in,
 * one outcome out, both plain data.
 *
 * A task carries its input as canonical JSON (stableJson): the same text is the result cache's
 * key, so what is computed is exactly what the key names, and the worker parses it off the main
 * thread (a string crosses the thread boundary as one copy).
 */

/** The plan of common/src/conditions/plan.ts with its profile source already resolved. */
export interface PlanTaskInput {
  from: GeoPoint;
  to: GeoPoint;
  dateUtc: string;
  channelsKHz: number[];
  slotMinutes: number;
  /** `'model'`: the diurnal model at the control point per slot; otherwise this profile. */
  profile: 'model' | ProfileData;
}

export type ComputeTask = (
  | {
      kind: 'route';
      route: ComputeRoute;
      /** stableJson of the request body; `''` for no body (`undefined`, which JSON cannot say) */
      json: string;
    }
  | { kind: 'plan'; /** stableJson of a PlanTaskInput */ json: string }
) & {
  /**
   * Ask the worker for the outcome as JSON text (a ComputeReply string): what the result cache
   * keeps, as compact on the heap as the text itself, and cheap to pass between threads.
   */
  serialize?: boolean;
};

export type ComputeOutcome =
  | { ok: true; result: unknown }
  | {
      ok: false;
      status: 400 | 422 | 500;
      message: string;
      fields?: Record<string, string>;
      /** Set for ConvergenceError: its message and last state, for the server log. */
      convergence?: string;
      /** Set for unexpected errors: the stack, for the server log only. */
      internal?: string;
    };

/** What a worker answers: the outcome, or its JSON text when the task asked to `serialize`. */
export type ComputeReply = ComputeOutcome | string;

/**
 * JSON with every object's keys in sorted order, so equal values give equal text whatever the
 * key order they were built or sent in.
 */
export function stableJson(value: unknown): string {
  const json = JSON.stringify(value, (_key, v: unknown) =>
    v !== null && typeof v === 'object' && !Array.isArray(v)
      ? Object.fromEntries(
          Object.keys(v)
            .sort()
            .map((k) => [k, (v as Record<string, unknown>)[k]]),
        )
      : v,
  ) as string | undefined;
  if (json === undefined) throw new TypeError('stableJson: not representable as JSON');
  return json;
}

export const routeTask = (route: ComputeRoute, body: unknown): ComputeTask => ({
  kind: 'route',
  route,
  json: body === undefined ? '' : stableJson(body),
});

export const planTask = (input: PlanTaskInput): ComputeTask => ({
  kind: 'plan',
  json: stableJson(input),
});
