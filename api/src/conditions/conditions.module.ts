import { Module } from '@nestjs/common';
import { ProfilesModule } from '../profiles/profiles.module.js';
import { ConditionsController } from './conditions.controller.js';
import { ConditionsRepository } from './conditions.repository.js';
import { ConditionsService } from './conditions.service.js';
import { FEED_CONFIG, loadFeedConfig } from './feed-config.js';

/** The conditions feed (poller, in-process stand-in) and the built-in diurnal model. */
@Module({
  imports: [ProfilesModule],
  controllers: [ConditionsController],
  providers: [
    { provide: FEED_CONFIG, useFactory: () => loadFeedConfig(process.env) },
    ConditionsRepository,
    ConditionsService,
  ],
  exports: [ConditionsService],
})
export class ConditionsModule {}
