import { Module } from '@nestjs/common';
import { ProfilesModule } from '../profiles/profiles.module.js';
import { ConditionsController } from './conditions.controller.js';
import { ConditionsRepository } from './conditions.repository.js';
import { ConditionsService } from './conditions.service.js';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { FEED_CONFIG } from './feed-config.js';

/** The conditions feed (poller, in-process stand-in) and the built-in diurnal model. */
@Module({
  imports: [ProfilesModule],
  controllers: [ConditionsController],
  providers: [
    { provide: FEED_CONFIG, useFactory: (config: AppConfig) => config.feed, inject: [APP_CONFIG] },
    ConditionsRepository,
    ConditionsService,
  ],
  exports: [ConditionsService],
})
export class ConditionsModule {}
