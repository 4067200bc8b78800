import type { ProfileData, UserView } from '@hopwise/common';
import { Injectable } from '@nestjs/common';
import { canSeeProfile } from './profile-access.js';
import { ProfilesRepository } from './profiles.repository.js';

/**
 * Resolves `{ profile: { id } }` of the compute routes: the stored profile if this user may see
 * it (own, published, or any for an admin), else undefined (→ 400 naming `profile.id`).
 * Synchronous, as runCompute's resolveProfile is (better-sqlite3 reads are synchronous).
 */
@Injectable()
export class ProfileLookup {
  constructor(private readonly profiles: ProfilesRepository) {}

  resolveForUser(id: number, user: UserView): ProfileData | undefined {
    const row = this.profiles.findById(id);
    return row && canSeeProfile(row, user) ? row.profile : undefined;
  }
}
