import { Module } from '@nestjs/common';
import { AuditController } from './audit.controller.js';
import { AuditRepository } from './audit.repository.js';
import { DrizzleAuditRepository } from './drizzle-audit.repository.js';

@Module({
  controllers: [AuditController],
  providers: [{ provide: AuditRepository, useClass: DrizzleAuditRepository }],
})
export class AuditModule {}
