import { Module } from '@nestjs/common';
import { ComputeModule } from '../compute/compute.module.js';
import { LinksModule } from '../links/links.module.js';
import { ProfilesModule } from '../profiles/profiles.module.js';
import { DrizzleStudiesRepository } from './drizzle-studies.repository.js';
import { ReferenceProfiles } from './reference-profiles.js';
import {
  LinkLatestStudyController,
  ReferenceProfilesController,
  StudiesController,
} from './studies.controller.js';
import { StudiesRepository } from './studies.repository.js';
import { StudiesService } from './studies.service.js';

/** Link studies (run through the compute module's worker pool) and the reference profiles. */
@Module({
  imports: [ComputeModule, LinksModule, ProfilesModule],
  controllers: [StudiesController, LinkLatestStudyController, ReferenceProfilesController],
  providers: [
    StudiesService,
    ReferenceProfiles,
    { provide: StudiesRepository, useClass: DrizzleStudiesRepository },
  ],
})
export class StudiesModule {}
