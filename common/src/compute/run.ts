/**
 * One entry point for the compute routes of SPEC §3, shared by the API controller and the batch
 * CLI: parse the body, resolve and build the profile, run the physics, return the response.
 * Errors: InputError → 400 (names the field), NoSolutionError → 422.
 */
import { z } from 'zod';
import { ConvergenceError, InputError, NoSolutionError } from '../physics/errors.js';
import { computeOblique } from '../physics/homing.js';
import { invertTrace, type InvertedSample } from '../physics/inversion.js';
import { plasmaProperties, type PlasmaResult } from '../physics/plasma.js';
import { buildProfile, type Profile, type ProfileData } from '../physics/profile.js';
import { slantPath, type SlantResult } from '../physics/slant.js';
import { verticalIonogram, type VerticalResponse } from '../physics/vertical.js';
import {
  COMPUTE_ROUTES,
  computeRequestSchemas,
  parseRequest,
  zodErrorToInputError,
  type ComputeRoute,
  type ProfileInput,
} from './schemas.js';

export interface ComputeResponses {
  plasma: PlasmaResult;
  vertical: VerticalResponse;
  oblique: ReturnType<typeof computeOblique>;
  slant: SlantResult;
  invert: { samples: InvertedSample[] };
}

export interface ComputeOptions {
  /** Looks up a stored profile by id (the API passes one; the CLI does not). */
  resolveProfile?: (id: number) => ProfileData | undefined;
}

function resolveProfile(
  input: ProfileInput,
  options: ComputeOptions,
  earthRadiusKm: number | undefined,
): Profile {
  let data: ProfileData;
  if (input.id !== undefined) {
    if (!options.resolveProfile) {
      throw new InputError(
        'profile.id: stored profiles need the server; send layers or samples inline',
        {
          'profile.id': 'stored profiles need the server; send layers or samples inline',
        },
      );
    }
    const stored = options.resolveProfile(input.id);
    if (!stored) {
      throw new InputError(`profile.id: no profile with id ${input.id}`, {
        'profile.id': `no profile with id ${input.id}`,
      });
    }
    data = stored;
  } else if (input.layers !== undefined) {
    data = { layers: input.layers };
  } else {
    data = {
      samples: (input.samples ?? []).map((s) =>
        s.electronDensityPerM3 !== undefined
          ? { heightKm: s.heightKm, electronDensityPerM3: s.electronDensityPerM3 }
          : { heightKm: s.heightKm, plasmaFrequencyMHz: s.plasmaFrequencyMHz as number },
      ),
    };
  }
  return builtProfile(data, earthRadiusKm);
}

/** Built profiles kept per thread (a worker serves many requests on the same few profiles). */
const BUILT_PROFILES_KEPT = 32;
const builtProfiles = new Map<string, Profile>();

/**
 * buildProfile, memoised by the profile's data: a Profile is immutable, and the physics keeps its
 * height grid and quadrature nodes on it (oblique.ts profileTable), so a sweep of frequencies or
 * ranges on one profile builds them once instead of per request. Bounded LRU; errors are thrown,
 * never kept.
 */
function builtProfile(data: ProfileData, earthRadiusKm: number | undefined): Profile {
  const key = JSON.stringify([earthRadiusKm ?? null, data]);
  let profile = builtProfiles.get(key);
  if (profile) {
    builtProfiles.delete(key); // re-insert: most recently used last
  } else {
    profile = buildProfile(data, { earthRadiusKm });
    if (builtProfiles.size >= BUILT_PROFILES_KEPT) {
      builtProfiles.delete(builtProfiles.keys().next().value as string);
    }
  }
  builtProfiles.set(key, profile);
  return profile;
}

export function isComputeRoute(route: unknown): route is ComputeRoute {
  return typeof route === 'string' && (COMPUTE_ROUTES as string[]).includes(route);
}

/** Runs one compute route on an unparsed body; throws InputError / NoSolutionError. */
export function runCompute<R extends ComputeRoute>(
  route: R,
  body: unknown,
  options: ComputeOptions = {},
): ComputeResponses[R] {
  if (!isComputeRoute(route)) {
    throw new InputError(`route: unknown compute route '${String(route)}'`, {
      route: `must be one of ${COMPUTE_ROUTES.join(', ')}`,
    });
  }
  const responses: { [K in ComputeRoute]: () => ComputeResponses[K] } = {
    plasma: () => {
      const b = parseRequest(computeRequestSchemas.plasma, body);
      const input =
        b.electronDensityPerM3 !== undefined
          ? { electronDensityPerM3: b.electronDensityPerM3 }
          : { plasmaFrequencyMHz: b.plasmaFrequencyMHz as number };
      return plasmaProperties(input, b.frequencyMHz);
    },
    vertical: () => {
      const b = parseRequest(computeRequestSchemas.vertical, body);
      return verticalIonogram(
        resolveProfile(b.profile, options, b.earthRadiusKm),
        b.frequenciesMHz,
      );
    },
    oblique: () => {
      const { profile, earthRadiusKm, ...params } = parseRequest(
        computeRequestSchemas.oblique,
        body,
      );
      return computeOblique(resolveProfile(profile, options, earthRadiusKm), params);
    },
    slant: () => {
      const { profile, earthRadiusKm, ...params } = parseRequest(computeRequestSchemas.slant, body);
      return slantPath(resolveProfile(profile, options, earthRadiusKm), params);
    },
    invert: () => invertTrace(parseRequest(computeRequestSchemas.invert, body).trace),
  };
  return responses[route]() as ComputeResponses[R];
}

export interface ComputeErrorStatus {
  status: 400 | 422 | 500;
  message: string;
  fields?: Record<string, string>;
}

/**
 * Maps an error thrown by runCompute to an HTTP status. A ConvergenceError (an ill-conditioned
 * case, e.g. a ray grazing a layer peak) is answered 422 rather than 500: the input was valid but
 * no reliable answer was found.
 */
export function computeErrorStatus(err: unknown): ComputeErrorStatus {
  if (err instanceof z.ZodError) err = zodErrorToInputError(err);
  if (err instanceof InputError) return { status: 400, message: err.message, fields: err.fields };
  if (err instanceof NoSolutionError) return { status: 422, message: err.message };
  if (err instanceof ConvergenceError) {
    return { status: 422, message: `no reliable answer: ${err.message} (ill-conditioned case)` };
  }
  return { status: 500, message: 'internal error' };
}
