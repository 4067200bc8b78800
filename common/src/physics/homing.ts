/**
 * Oblique modes of a link (SPEC §3 `POST /api/compute/oblique`): every elevation β₀ ≥ the minimum
 * with n·D₁(β₀) = G (n ground-reflected hops of equal length), n = 1..maxHops, found by bracketing
 * sign changes of n·D₁ − G on the elevation scan (elevation-scan.ts) and Brent's method.
 *
 *   group delay     τ = P′/c
 *   phase advance   P′ − P ≥ 0 [km], in carrier cycles (P′ − P)·f/c        (SPEC §2)
 *   ray             'low' if dD₁/dβ₀ < 0, else 'high' (Pedersen ray)
 *   layer           the lowest profile peak at or above the apex height
 *   multipath spread  max − min group delay over the modes (0 for one, null for none)
 */
import {
  M_PER_KM,
  RAD_PER_DEG,
  SPEED_OF_LIGHT_KM_PER_MS,
  SPEED_OF_LIGHT_MPS,
} from './constants.js';
import { scanElevations } from './elevation-scan.js';
import { InputError } from './errors.js';
import { mufPerHopsCached } from './muf.js';
import {
  hopIntegrals,
  prepareMedium,
  type EarthModel,
  type HopIntegrals,
  type ObliqueMedium,
} from './oblique.js';
import type { Profile } from './profile.js';
import { brentRoot } from './quadrature.js';
import { rayPathPoints, type RayPathPoint } from './raypath.js';

export interface ObliqueParams {
  frequencyMHz: number;
  groundRangeKm: number;
  maxHops: number;
  minElevationDeg: number;
  earth: EarthModel;
  mufs: boolean;
  includeRayPath: boolean;
}

export interface ObliqueMode {
  label: string;
  hops: number;
  layer: string;
  ray: 'low' | 'high';
  elevationDeg: number;
  apexHeightKm: number;
  groupPathKm: number;
  phasePathKm: number;
  groupDelayMs: number;
  phaseAdvanceKm: number;
  phaseAdvanceCycles: number;
  rayPath?: RayPathPoint[];
}

export interface ObliqueResponse {
  modes: ObliqueMode[];
  mufMHz?: Record<string, number | null>;
  multipathSpreadMs: number | null;
}

/** Brent tolerance on the elevation [rad] of a mode (≈ 6e-9°). */
const ELEVATION_TOLERANCE_RAD = 1e-10;
const MHZ_TO_HZ = 1e6;

/** Checks the link parameters; throws InputError naming the field. */
export function validateObliqueParams(params: ObliqueParams): void {
  const fields: Record<string, string> = {};
  const { frequencyMHz, groundRangeKm, maxHops, minElevationDeg, earth } = params;
  if (!(Number.isFinite(frequencyMHz) && frequencyMHz > 0 && frequencyMHz <= 1000)) {
    fields.frequencyMHz = 'must be a number in (0, 1000]';
  }
  if (!(Number.isFinite(groundRangeKm) && groundRangeKm > 0 && groundRangeKm <= 40_000)) {
    fields.groundRangeKm = 'must be a number in (0, 40000]';
  }
  if (!(Number.isInteger(maxHops) && maxHops >= 1 && maxHops <= 6)) {
    fields.maxHops = 'must be an integer from 1 to 6';
  }
  if (!(Number.isFinite(minElevationDeg) && minElevationDeg >= 0 && minElevationDeg < 90)) {
    fields.minElevationDeg = 'must be a number in [0, 90)';
  }
  if (earth !== 'spherical' && earth !== 'flat') fields.earth = "must be 'spherical' or 'flat'";
  const keys = Object.keys(fields);
  if (keys.length) throw new InputError(`${keys[0]}: ${fields[keys[0]]}`, fields);
}

/** The reflecting layer: the lowest peak whose height is at or above the apex (SPEC §3). */
export function reflectingLayer(
  profile: Profile,
  apexHeightKm: number,
): { name: string; heightKm: number } {
  const peaks = profile.peaks;
  for (const p of peaks) if (p.heightKm >= apexHeightKm - 1e-9) return p;
  return peaks.length
    ? peaks[peaks.length - 1]
    : { name: 'peak1', heightKm: profile.maxPlasmaFrequencyHeightKm };
}

interface Solution {
  hops: number;
  elevationRad: number;
  ray: 'low' | 'high';
  /** The hop integrals at elevationRad when the search computed them (spares a recomputation). */
  hop?: HopIntegrals;
}

/** Every (hops, elevation) with hops·D₁ = G on the scan of one frequency. */
export function findSolutions(
  medium: ObliqueMedium,
  groundRangeKm: number,
  maxHops: number,
  minElevationRad: number,
): Solution[] {
  const targets = Array.from({ length: maxHops }, (_, i) => groundRangeKm / (i + 1));
  // Refine a sampled extremum only if the true one could cross some target between samples.
  const near = (d: number, isMin: boolean) =>
    targets.some((t) => (isMin ? d > t && d < 1.5 * t : d < t && d > t / 1.5));
  const intervals = scanElevations(medium, minElevationRad, near, targets);
  const out: Solution[] = [];
  for (let n = 1; n <= maxHops; n++) {
    const target = targets[n - 1];
    for (const iv of intervals) {
      const s = iv.samples;
      for (let i = 0; i + 1 < s.length; i++) {
        const d0 = s[i].groundRangeKm - target;
        const d1 = s[i + 1].groundRangeKm - target;
        if (d0 === 0 && i > 0) continue; // counted as the right end of the previous pair
        if (!(d0 * d1 < 0 || d0 === 0)) continue;
        let last: HopIntegrals | undefined;
        let lastRad = Number.NaN;
        const lo = s[i].elevationRad;
        const hi = s[i + 1].elevationRad;
        const root =
          d0 === 0
            ? lo
            : brentRoot(
                (x) => {
                  // The bracket ends are samples: their values are known.
                  if (x === lo) return d0;
                  if (x === hi) return d1;
                  const hop = hopIntegrals(medium, x);
                  if (hop) {
                    last = hop;
                    lastRad = x;
                  }
                  return hop ? hop.groundRangeKm - target : Number.NaN;
                },
                lo,
                hi,
                { tolerance: ELEVATION_TOLERANCE_RAD },
              );
        if (root === null) continue;
        out.push({
          hops: n,
          elevationRad: root,
          ray: s[i + 1].groundRangeKm > s[i].groundRangeKm ? 'high' : 'low',
          hop: root === lastRad ? last : undefined,
        });
      }
    }
  }
  return out;
}

/** The oblique route: modes, MUF per hop count and multipath spread (SPEC §3). */
export function computeOblique(profile: Profile, params: ObliqueParams): ObliqueResponse {
  validateObliqueParams(params);
  const { frequencyMHz, groundRangeKm, maxHops, minElevationDeg, earth } = params;
  const minElevationRad = minElevationDeg * RAD_PER_DEG;
  const medium = prepareMedium(profile, frequencyMHz, earth);
  const modes: (ObliqueMode & { layerHeightKm: number })[] = [];
  for (const sol of findSolutions(medium, groundRangeKm, maxHops, minElevationRad)) {
    const hop = sol.hop ?? hopIntegrals(medium, sol.elevationRad);
    if (!hop) continue;
    const n = sol.hops;
    const layer = reflectingLayer(profile, hop.apexHeightKm);
    const groupPathKm = n * hop.groupPathKm;
    const phasePathKm = n * hop.phasePathKm;
    const phaseAdvanceKm = Math.max(0, groupPathKm - phasePathKm);
    const mode: ObliqueMode & { layerHeightKm: number } = {
      label: `${n}${layer.name}`,
      hops: n,
      layer: layer.name,
      ray: sol.ray,
      elevationDeg: sol.elevationRad / RAD_PER_DEG,
      apexHeightKm: hop.apexHeightKm,
      groupPathKm,
      phasePathKm,
      groupDelayMs: groupPathKm / SPEED_OF_LIGHT_KM_PER_MS,
      phaseAdvanceKm,
      phaseAdvanceCycles:
        (phaseAdvanceKm * M_PER_KM * frequencyMHz * MHZ_TO_HZ) / SPEED_OF_LIGHT_MPS,
      layerHeightKm: layer.heightKm,
    };
    if (params.includeRayPath) {
      mode.rayPath = rayPathPoints(
        medium,
        sol.elevationRad,
        hop.apexHeightKm,
        hop.groundRangeKm,
        n,
      );
    }
    modes.push(mode);
  }
  modes.sort(
    (p, q) =>
      p.hops - q.hops ||
      p.layerHeightKm - q.layerHeightKm ||
      (p.ray === q.ray ? 0 : p.ray === 'low' ? -1 : 1) ||
      p.elevationDeg - q.elevationDeg,
  );
  const clean: ObliqueMode[] = modes.map(({ layerHeightKm: _drop, ...m }) => m);
  const delays = clean.map((m) => m.groupDelayMs);
  const multipathSpreadMs = delays.length ? Math.max(...delays) - Math.min(...delays) : null;
  return params.mufs
    ? {
        modes: clean,
        mufMHz: mufPerHopsCached(profile, groundRangeKm, maxHops, minElevationDeg, earth),
        multipathSpreadMs,
      }
    : { modes: clean, multipathSpreadMs };
}
