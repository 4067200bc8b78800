import type { LinkRow } from '../db/schema.js';
import type { AuditEntry } from '../stations/stations.repository.js';
import type { Viewer } from '../stations/station-access.js';

export type LinkWithOwner = LinkRow & { ownerName: string };

export interface LinkFilter {
  /** Links from or to this station. */
  stationId?: number;
  limit: number;
  offset: number;
}

export interface NewLink {
  ownerId: number;
  name: string;
  fromStationId: number;
  toStationId: number;
}

export type LinkPatch = Partial<Omit<NewLink, 'ownerId'>>;

/** Storage of links; bound to DrizzleLinksRepository in LinksModule. Synchronous (better-sqlite3). */
export abstract class LinksRepository {
  /** A live link, whoever owns it. */
  abstract findById(id: number): LinkWithOwner | undefined;
  /** Own links (all for an admin), filtered and paged. */
  abstract list(viewer: Viewer, filter: LinkFilter): { rows: LinkWithOwner[]; total: number };
  abstract findByOwnerAndName(
    ownerId: number,
    name: string,
    exceptId?: number,
  ): LinkRow | undefined;
  /** Throws LinkNameTakenError on a duplicate live name. */
  abstract create(link: NewLink, audit: AuditEntry): LinkWithOwner;
  abstract update(id: number, patch: LinkPatch, audit: AuditEntry): LinkWithOwner | undefined;
  /** Soft-deletes the link and its studies in one transaction; returns the number of studies. */
  abstract softDelete(id: number, audit: AuditEntry): { deleted: boolean; studies: number };
}

export class LinkNameTakenError extends Error {
  constructor(readonly linkName: string) {
    super(`You already have a link named ${linkName}`);
    this.name = 'LinkNameTakenError';
  }
}
