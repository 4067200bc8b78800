import { Module } from '@nestjs/common';
import { ComputeModule } from '../compute/compute.module.js';
import { ConditionsModule } from '../conditions/conditions.module.js';
import { LinksModule } from '../links/links.module.js';
import { ProfilesModule } from '../profiles/profiles.module.js';
import { StationsModule } from '../stations/stations.module.js';
import { PlanController } from './plan.controller.js';
import { PlanService } from './plan.service.js';

/** POST /api/compute/plan; PlanService is also used by nets and the watch. */
@Module({
  imports: [ComputeModule, ConditionsModule, LinksModule, ProfilesModule, StationsModule],
  controllers: [PlanController],
  providers: [PlanService],
  exports: [PlanService],
})
export class PlanModule {}
