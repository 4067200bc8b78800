import { Module } from '@nestjs/common';
import { PlanModule } from '../plan/plan.module.js';
import { StationsModule } from '../stations/stations.module.js';
import { UsersModule } from '../users/users.module.js';
import { NetsDemoSeed } from './nets-demo-seed.js';
import { NetsController } from './nets.controller.js';
import { NetsRepository } from './nets.repository.js';
import { NetsService } from './nets.service.js';

/** Nets, draft and published schedules, CSV/iCalendar export; NetsService for the watch. */
@Module({
  imports: [PlanModule, StationsModule, UsersModule],
  controllers: [NetsController],
  providers: [NetsService, NetsRepository, NetsDemoSeed],
  exports: [NetsService, NetsDemoSeed],
})
export class NetsModule {}
