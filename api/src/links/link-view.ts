import { pathGeometry, type LinkView } from '@hopwise/common';
import { toStationView } from '../stations/station-view.js';
import type { StationWithOwner } from '../stations/stations.repository.js';
import type { LinkWithOwner } from './links.repository.js';

/** A link with its stations and its geometry (great circle on R₀ = 6371 km, WGS-84 alongside). */
export function toLinkView(
  row: LinkWithOwner,
  from: StationWithOwner,
  to: StationWithOwner,
): LinkView {
  const geometry = pathGeometry(from, to);
  return {
    id: row.id,
    ownerId: row.ownerId,
    ownerName: row.ownerName,
    name: row.name,
    fromStationId: row.fromStationId,
    toStationId: row.toStationId,
    fromStation: toStationView(from),
    toStation: toStationView(to),
    distanceKm: geometry.distanceKm,
    geodesicDistanceKm: geometry.geodesicDistanceKm,
    bearingDeg: geometry.bearingDeg,
    reverseBearingDeg: geometry.reverseBearingDeg,
    midpoint: geometry.midpoint,
    createdAt: row.createdAt,
    updatedAt: row.updatedAt,
  };
}
