/**
 * Stations, links and link studies as the API returns them (SPEC §3.1), shared by the API and the
 * client. Angles in degrees (latitude north +, longitude east +, bearings clockwise from true
 * north); times ISO 8601 UTC.
 */
import type { GeoPoint } from '../geo/great-circle.js';
import type { ObliqueResponse } from '../physics/homing.js';
import type { ProfileData } from '../physics/profile.js';

export interface StationView {
  id: number;
  ownerId: number;
  /** Display name of the owner. */
  ownerName: string;
  name: string;
  callSign: string | null;
  latDeg: number;
  lonDeg: number;
  elevationM: number | null;
  notes: string | null;
  /** Shared stations are visible to every user and usable in their links. */
  shared: boolean;
  createdAt: string;
  updatedAt: string;
}

export interface LinkView {
  id: number;
  ownerId: number;
  ownerName: string;
  name: string;
  fromStationId: number;
  toStationId: number;
  fromStation: StationView;
  toStation: StationView;
  /** Great-circle distance on the sphere R₀ = 6371 km (ITU-R P.533) [km]: the physics' ground range. */
  distanceKm: number;
  /** WGS-84 geodesic distance [km], for reference. */
  geodesicDistanceKm: number;
  bearingDeg: number;
  reverseBearingDeg: number;
  /** Half-way point on the great circle (the control point of a one-hop path). */
  midpoint: GeoPoint;
  createdAt: string;
  updatedAt: string;
}

/** What the user chose as the study's profile. */
export type StudyProfileSource =
  | { kind: 'reference'; key: string }
  | { kind: 'inline'; profile: ProfileData }
  | { kind: 'library'; id: number };

export type StudyFrequencyResult = { frequencyMHz: number } & ObliqueResponse;

export interface StudyResult {
  /** The link's great-circle distance at the time of the study [km]. */
  groundRangeKm: number;
  /** One oblique response per requested frequency, in request order. */
  perFrequency: StudyFrequencyResult[];
}

export interface StudyView {
  id: number;
  ownerId: number;
  linkId: number;
  name: string | null;
  atUtc: string;
  profileSource: StudyProfileSource;
  /** The profile actually used (copied at creation). */
  profile: ProfileData;
  frequenciesMHz: number[];
  result: StudyResult;
  createdAt: string;
  updatedAt: string;
}

/** A read-only reference profile file of the repository's profiles/ folder (invented demo data). */
export interface ReferenceProfileView {
  /** File name without `.json`, e.g. `quiet-day`. */
  key: string;
  name: string;
  description: string | null;
  validAtUtc: string | null;
  latDeg: number | null;
  lonDeg: number | null;
  profile: ProfileData;
}

/** Columns of `GET /api/studies/:id/export.csv`, in order (one row per frequency and mode). */
export const STUDY_CSV_COLUMNS = [
  'study_id',
  'link',
  'at_utc',
  'frequency_mhz',
  'label',
  'hops',
  'layer',
  'ray',
  'elevation_deg',
  'apex_height_km',
  'group_path_km',
  'phase_path_km',
  'group_delay_ms',
  'phase_advance_km',
  'phase_advance_cycles',
  'muf_1_mhz',
  'muf_2_mhz',
  'muf_3_mhz',
  'muf_4_mhz',
  'multipath_spread_ms',
] as const;
