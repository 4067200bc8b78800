import type { NewSoundingRow, SoundingRow } from '../db/schema/profiles.js';
import type { AuditEntry, Viewer } from '../profiles/profiles.repository.js';

export type SoundingPatch = Partial<
  Pick<NewSoundingRow, 'name' | 'observedAtUtc' | 'latDeg' | 'lonDeg' | 'trace'>
>;

/** Storage of sounding traces; bound to DrizzleSoundingsRepository in SoundingsModule. */
export abstract class SoundingsRepository {
  abstract findById(id: number): SoundingRow | undefined;
  abstract list(
    viewer: Viewer,
    filter: { ownerId?: number },
    page: { limit: number; offset: number },
  ): { rows: SoundingRow[]; total: number };
  abstract create(row: NewSoundingRow, audit: AuditEntry): SoundingRow;
  abstract update(id: number, patch: SoundingPatch, audit: AuditEntry): SoundingRow | undefined;
  abstract softDelete(id: number, audit: AuditEntry): boolean;
  abstract count(): number;
}
