import type { StudyView } from '@hopwise/common';
import type { StudyRow } from '../db/schema.js';

/** Without ray paths the result is the mode table only: a list item is ~1 kB, not ~40 kB. */
function withoutRayPaths(result: StudyRow['result']): StudyRow['result'] {
  return {
    ...result,
    perFrequency: result.perFrequency.map((f) => ({
      ...f,
      modes: f.modes.map(({ rayPath: _rayPath, ...mode }) => mode),
    })),
  };
}

export function toStudyView(row: StudyRow, rayPaths = true): StudyView {
  return {
    id: row.id,
    ownerId: row.ownerId,
    linkId: row.linkId,
    name: row.name,
    atUtc: row.atUtc,
    profileSource: row.profileSource,
    profile: row.profile,
    frequenciesMHz: row.frequenciesMHz,
    result: rayPaths ? row.result : withoutRayPaths(row.result),
    createdAt: row.createdAt,
    updatedAt: row.updatedAt,
  };
}
