import type { NewStudyRow, StudyRow } from '../db/schema.js';
import type { Viewer } from '../stations/station-access.js';
import type { AuditEntry } from '../stations/stations.repository.js';

export type StudySort = 'atUtc' | 'createdAt';

export interface StudyFilter {
  linkId?: number;
  /** Inclusive bounds on at_utc (ISO 8601 UTC, normalised). */
  fromUtc?: string;
  toUtc?: string;
  sort: StudySort;
  order: 'asc' | 'desc';
  limit: number;
  offset: number;
}

export type NewStudy = Omit<NewStudyRow, 'id' | 'createdAt' | 'updatedAt' | 'deletedAt'>;

/** Storage of studies; bound to DrizzleStudiesRepository in StudiesModule. Synchronous (better-sqlite3). */
export abstract class StudiesRepository {
  /** A live study whose link is live too, whoever owns it. */
  abstract findById(id: number): StudyRow | undefined;
  /** Own studies (all for an admin) of live links, filtered, sorted and paged. */
  abstract list(viewer: Viewer, filter: StudyFilter): { rows: StudyRow[]; total: number };
  /** The most recently created study of a link that this viewer may see. */
  abstract latestOfLink(viewer: Viewer, linkId: number): StudyRow | undefined;
  abstract create(study: NewStudy, audit: AuditEntry): StudyRow;
  abstract update(
    id: number,
    patch: { name: string | null },
    audit: AuditEntry,
  ): StudyRow | undefined;
  abstract softDelete(id: number, audit: AuditEntry): boolean;
}
