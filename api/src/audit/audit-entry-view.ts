import type { AuditEntryView } from '@hopwise/common';
import { ApiProperty } from '@nestjs/swagger';

export type { AuditEntryView };

export class AuditEntryViewDto implements AuditEntryView {
  @ApiProperty() id!: number;
  @ApiProperty({ example: '2026-03-18T12:00:00.000Z' }) at!: string;
  @ApiProperty({ type: Number, nullable: true }) actorUserId!: number | null;
  @ApiProperty({ type: String, nullable: true }) actorEmail!: string | null;
  @ApiProperty({ type: String, nullable: true }) actorName!: string | null;
  @ApiProperty({ example: 'user.update' }) action!: string;
  @ApiProperty({ example: 'user:12' }) target!: string;
  @ApiProperty({ type: Object, nullable: true }) detail!: Record<string, unknown> | null;
}

export class AuditListDto {
  @ApiProperty({ type: [AuditEntryViewDto] }) items!: AuditEntryViewDto[];
  @ApiProperty() total!: number;
}
