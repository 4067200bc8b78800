/**
 * Response shapes of the profile library routes (/api/profiles, /api/soundings), shared by the
 * API and the client. Times are ISO 8601 UTC strings; figures are derived with the physics core
 * when a profile is written.
 */
import type { TracePoint } from '../physics/inversion.js';
import type { ProfileData } from '../physics/profile.js';

export const PROFILE_SOURCES = ['layers', 'upload', 'inversion', 'feed', 'model'] as const;
export type ProfileSource = (typeof PROFILE_SOURCES)[number];

export interface ProfileView {
  id: number;
  ownerId: number;
  ownerName: string;
  name: string;
  source: ProfileSource;
  /** 'layers' or 'samples' (which form `profile` has). */
  kind: 'layers' | 'samples';
  validAtUtc: string | null;
  latDeg: number | null;
  lonDeg: number | null;
  published: boolean;
  foEMHz: number | null;
  foF1MHz: number | null;
  foF2MHz: number;
  hmF2Km: number;
  verticalTecu: number;
  /** E.g. `{ fileName }` for uploads, `{ soundingId, soundingName }` for inversions. */
  provenance: Record<string, unknown> | null;
  createdAt: string;
  updatedAt: string;
  /** The profile itself: always on single-profile responses, on lists only with `?full=true`. */
  profile?: ProfileData;
}

export interface SoundingView {
  id: number;
  ownerId: number;
  name: string;
  observedAtUtc: string;
  latDeg: number;
  lonDeg: number;
  pointCount: number;
  minFrequencyMHz: number;
  maxFrequencyMHz: number;
  createdAt: string;
  updatedAt: string;
  /** Always on single-sounding responses, on lists only with `?full=true`. */
  trace?: TracePoint[];
}

export interface ProfileCompareRange {
  groundRangeKm: number;
  /** One-hop MUF at this range [MHz], null if no one-hop path exists. */
  muf1MHz: number | null;
  /** Group delay of the lowest-delay mode at the requested frequency [ms], null if none. */
  groupDelayMs: number | null;
}

export interface ProfileCompareItem {
  id: number;
  name: string;
  foEMHz: number | null;
  foF1MHz: number | null;
  foF2MHz: number;
  hmF2Km: number;
  /** F2 semi-thickness [km]: the layer's y_m, 2H for a Chapman layer, else estimated from N(h). */
  semiThicknessKm: number | null;
  verticalTecu: number;
  perRange: ProfileCompareRange[];
}

export interface ProfileCompareResponse {
  frequencyMHz: number;
  groundRangesKm: number[];
  items: ProfileCompareItem[];
}
