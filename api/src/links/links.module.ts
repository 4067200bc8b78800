import { Module } from '@nestjs/common';
import { StationsModule } from '../stations/stations.module.js';
import { UsersModule } from '../users/users.module.js';
import { DrizzleLinksRepository } from './drizzle-links.repository.js';
import { LinksDemoSeed } from './links-demo-seed.js';
import { LinksController } from './links.controller.js';
import { LinksRepository } from './links.repository.js';
import { LinksService } from './links.service.js';

@Module({
  imports: [StationsModule, UsersModule],
  controllers: [LinksController],
  providers: [
    LinksService,
    LinksDemoSeed,
    { provide: LinksRepository, useClass: DrizzleLinksRepository },
  ],
  exports: [LinksService, LinksDemoSeed],
})
export class LinksModule {}
