import { Module } from '@nestjs/common';
import { ProfilesModule } from '../profiles/profiles.module.js';
import { UsersModule } from '../users/users.module.js';
import { LibraryDemoSeed } from './library-demo-seed.js';
import { DrizzleSoundingsRepository } from './drizzle-soundings.repository.js';
import { SoundingsController } from './soundings.controller.js';
import { SoundingsRepository } from './soundings.repository.js';
import { SoundingsService } from './soundings.service.js';

/** Sounding traces: CRUD, upload, inversion into the profile library. */
@Module({
  imports: [ProfilesModule, UsersModule],
  controllers: [SoundingsController],
  providers: [
    SoundingsService,
    LibraryDemoSeed,
    { provide: SoundingsRepository, useClass: DrizzleSoundingsRepository },
  ],
  exports: [SoundingsService, LibraryDemoSeed],
})
export class SoundingsModule {}
