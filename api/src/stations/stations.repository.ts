import type { StationRow } from '../db/schema.js';
import type { Viewer } from './station-access.js';

/** Who made a change, written to audit_log in the same transaction as the change. */
export interface AuditEntry {
  actorUserId: number | null;
  action: string;
  detail?: Record<string, unknown>;
}

export interface StationUsage {
  links: number;
  nets: number;
}

export type StationWithOwner = StationRow & { ownerName: string };

export interface StationFilter {
  /** Case-insensitive substring of the name or call sign. */
  q?: string;
  /** Only the viewer's own stations. */
  mine?: boolean;
  limit: number;
  offset: number;
}

export interface NewStation {
  ownerId: number;
  name: string;
  callSign: string | null;
  latDeg: number;
  lonDeg: number;
  elevationM: number | null;
  notes: string | null;
  shared: boolean;
}

export type StationPatch = Partial<Omit<NewStation, 'ownerId'>>;

/** Storage of stations; bound to DrizzleStationsRepository in StationsModule. Synchronous (better-sqlite3). */
export abstract class StationsRepository {
  /** A live (not deleted) station, whoever owns it. */
  abstract findById(id: number): StationWithOwner | undefined;
  /** Live stations by id, whoever owns them. */
  abstract findByIds(ids: number[]): StationWithOwner[];
  /** Own + shared stations (all for an admin), filtered and paged. */
  abstract list(viewer: Viewer, filter: StationFilter): { rows: StationWithOwner[]; total: number };
  /** A live station of this owner with this name (case-insensitive), other than `exceptId`. */
  abstract findByOwnerAndName(
    ownerId: number,
    name: string,
    exceptId?: number,
  ): StationRow | undefined;
  /**
   * Live links and nets (as control or member station) that use the station; `notOwnedBy`
   * counts only those of other owners.
   */
  abstract usage(stationId: number, notOwnedBy?: number): StationUsage;
  /** Throws StationNameTakenError on a duplicate live name. */
  abstract create(station: NewStation, audit: AuditEntry): StationWithOwner;
  abstract update(id: number, patch: StationPatch, audit: AuditEntry): StationWithOwner | undefined;
  /** Soft-deletes an unused station (usage re-checked in the transaction); false if not done. */
  abstract softDelete(id: number, audit: AuditEntry): boolean;
}

export class StationNameTakenError extends Error {
  constructor(readonly stationName: string) {
    super(`You already have a station named ${stationName}`);
    this.name = 'StationNameTakenError';
  }
}
