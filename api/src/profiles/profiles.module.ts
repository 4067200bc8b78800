import { Module } from '@nestjs/common';
import { DrizzleProfilesRepository } from './drizzle-profiles.repository.js';
import { ProfileCompareService } from './profile-compare.service.js';
import { ProfileLookup } from './profile-lookup.js';
import { ProfilesController } from './profiles.controller.js';
import { ProfilesRepository } from './profiles.repository.js';
import { ProfilesService } from './profiles.service.js';

/** The profile library: CRUD, uploads, publishing, comparison; ProfileLookup for compute routes. */
@Module({
  controllers: [ProfilesController],
  providers: [
    ProfilesService,
    ProfileCompareService,
    ProfileLookup,
    { provide: ProfilesRepository, useClass: DrizzleProfilesRepository },
  ],
  exports: [ProfileLookup, ProfilesService],
})
export class ProfilesModule {}
