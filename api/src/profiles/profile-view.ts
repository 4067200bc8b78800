import type { ProfileView } from '@hopwise/common';
import type { ProfileWithOwner } from './profiles.repository.js';

export function toProfileView(row: ProfileWithOwner, includeProfile: boolean): ProfileView {
  const view: ProfileView = {
    id: row.id,
    ownerId: row.ownerId,
    ownerName: row.ownerName,
    name: row.name,
    source: row.source,
    kind: 'layers' in row.profile ? 'layers' : 'samples',
    validAtUtc: row.validAtUtc,
    latDeg: row.latDeg,
    lonDeg: row.lonDeg,
    published: row.published,
    foEMHz: row.foEMHz,
    foF1MHz: row.foF1MHz,
    foF2MHz: row.foF2MHz,
    hmF2Km: row.hmF2Km,
    verticalTecu: row.verticalTecu,
    provenance: row.provenance ?? null,
    createdAt: row.createdAt,
    updatedAt: row.updatedAt,
  };
  if (includeProfile) view.profile = row.profile;
  return view;
}
