import { Module } from '@nestjs/common';
import { ProfilesModule } from '../profiles/profiles.module.js';
import { ComputeController } from './compute.controller.js';
import { ComputeService } from './compute.service.js';

@Module({
  imports: [ProfilesModule],
  controllers: [ComputeController],
  providers: [ComputeService],
  exports: [ComputeService],
})
export class ComputeModule {}
