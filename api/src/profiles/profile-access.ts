import type { UserView } from '@hopwise/common';
import { ApiException } from '../http/api-error.js';
import type { ProfileWithOwner, Viewer } from './profiles.repository.js';

/** Admins see and change every row (SPEC §1: the site's administrator). */
export const isAdmin = (user: UserView) => user.role === 'admin';

export const viewerOf = (user: UserView): Viewer => ({ userId: user.id, seesAll: isAdmin(user) });

/** Owner sees own; everyone with profiles:read sees published ones; admin all. */
export function canSeeProfile(row: { ownerId: number; published: boolean }, user: UserView) {
  return row.ownerId === user.id || row.published || isAdmin(user);
}

export function notFound(kind: 'profile' | 'sounding', id: number): ApiException {
  return new ApiException(404, `${kind} ${id} not found`);
}

/** Changing a row needs its owner or an admin; others who can see it get 403. */
export function assertCanChange(row: ProfileWithOwner | { ownerId: number }, user: UserView) {
  if (row.ownerId !== user.id && !isAdmin(user)) {
    throw new ApiException(403, 'only the owner or an admin can change this record');
  }
}
