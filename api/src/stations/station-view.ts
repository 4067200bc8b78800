import type { StationView } from '@hopwise/common';
import type { StationWithOwner } from './stations.repository.js';

export function toStationView(row: StationWithOwner): StationView {
  return {
    id: row.id,
    ownerId: row.ownerId,
    ownerName: row.ownerName,
    name: row.name,
    callSign: row.callSign,
    latDeg: row.latDeg,
    lonDeg: row.lonDeg,
    elevationM: row.elevationM,
    notes: row.notes,
    shared: row.shared,
    createdAt: row.createdAt,
    updatedAt: row.updatedAt,
  };
}
