import type { StudyView } from '@hopwise/common';
import type { StudyRow } from '../db/schema.js';

export function toStudyView(row: StudyRow): StudyView {
  return {
    id: row.id,
    ownerId: row.ownerId,
    linkId: row.linkId,
    name: row.name,
    atUtc: row.atUtc,
    profileSource: row.profileSource,
    profile: row.profile,
    frequenciesMHz: row.frequenciesMHz,
    result: row.result,
    createdAt: row.createdAt,
    updatedAt: row.updatedAt,
  };
}
