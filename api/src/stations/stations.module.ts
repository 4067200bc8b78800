import { Module } from '@nestjs/common';
import { DrizzleStationsRepository } from './drizzle-stations.repository.js';
import { StationsController } from './stations.controller.js';
import { StationsRepository } from './stations.repository.js';
import { StationsService } from './stations.service.js';

@Module({
  controllers: [StationsController],
  providers: [
    StationsService,
    { provide: StationsRepository, useClass: DrizzleStationsRepository },
  ],
  exports: [StationsService, StationsRepository],
})
export class StationsModule {}
