import type { ProfileSource } from '@hopwise/common';
import type { NewProfileRow, ProfileRow } from '../db/schema/profiles.js';

/** Who made a change, written to audit_log in the same transaction as the change. */
export interface AuditEntry {
  actorUserId: number | null;
  action: string;
  detail?: Record<string, unknown>;
}

/** Whose rows a query may return: own and published ones, or all for an admin. */
export interface Viewer {
  userId: number;
  seesAll: boolean;
}

export interface ProfileFilter {
  source?: ProfileSource;
  ownerId?: number;
  published?: boolean;
  /** Valid time window (inclusive), ISO 8601 UTC. */
  fromUtc?: string;
  toUtc?: string;
  /** minLon, minLat, maxLon, maxLat; minLon > maxLon crosses the antimeridian. */
  bbox?: [number, number, number, number];
}

export type ProfileWithOwner = ProfileRow & { ownerName: string };
export type ProfilePatch = Partial<
  Pick<
    NewProfileRow,
    | 'name'
    | 'validAtUtc'
    | 'latDeg'
    | 'lonDeg'
    | 'profile'
    | 'foEMHz'
    | 'foF1MHz'
    | 'foF2MHz'
    | 'hmF2Km'
    | 'verticalTecu'
    | 'published'
  >
>;

/** Storage of the profile library; bound to DrizzleProfilesRepository in ProfilesModule. */
export abstract class ProfilesRepository {
  /** A live (not deleted) profile, whoever owns it. Synchronous: the compute routes need it so. */
  abstract findById(id: number): ProfileWithOwner | undefined;
  abstract list(
    viewer: Viewer,
    filter: ProfileFilter,
    page: { limit: number; offset: number },
  ): { rows: ProfileWithOwner[]; total: number };
  abstract create(row: NewProfileRow, audit: AuditEntry): ProfileRow;
  abstract update(id: number, patch: ProfilePatch, audit: AuditEntry): ProfileRow | undefined;
  abstract softDelete(id: number, audit: AuditEntry): boolean;
  abstract count(): number;
}
