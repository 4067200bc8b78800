import { Module } from '@nestjs/common';
import { ConditionsModule } from '../conditions/conditions.module.js';
import { NetsModule } from '../nets/nets.module.js';
import { NoticesModule } from '../notices/notices.module.js';
import { PlanModule } from '../plan/plan.module.js';
import { ContractWatchSources } from './contract-watch-sources.js';
import { WatchSources } from './watch-sources.js';
import { WatchService } from './watch.service.js';

/** The watch: re-evaluates published schedules and followed links, stores notices. */
@Module({
  imports: [NoticesModule, NetsModule, PlanModule, ConditionsModule],
  providers: [WatchService, { provide: WatchSources, useClass: ContractWatchSources }],
  exports: [WatchService],
})
export class WatchModule {}
