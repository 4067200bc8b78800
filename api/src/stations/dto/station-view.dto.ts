import type { StationView } from '@hopwise/common';
import { ApiProperty } from '@nestjs/swagger';

export class StationViewDto implements StationView {
  @ApiProperty({ example: 3 }) id!: number;
  @ApiProperty({ example: 1 }) ownerId!: number;
  @ApiProperty({ example: 'Dana Okafor (demo operator)' }) ownerName!: string;
  @ApiProperty({ example: 'Harrow Ridge relay' }) name!: string;
  @ApiProperty({ example: 'X1HRW', nullable: true, type: String }) callSign!: string | null;
  @ApiProperty({ example: 47.2 }) latDeg!: number;
  @ApiProperty({ example: 8.6 }) lonDeg!: number;
  @ApiProperty({ example: 420, nullable: true, type: Number }) elevationM!: number | null;
  @ApiProperty({ nullable: true, type: String }) notes!: string | null;
  @ApiProperty() shared!: boolean;
  @ApiProperty({ example: '2026-03-18T13:00:00.000Z' }) createdAt!: string;
  @ApiProperty({ example: '2026-03-18T13:00:00.000Z' }) updatedAt!: string;
}

export class StationListDto {
  @ApiProperty({ type: [StationViewDto] }) items!: StationViewDto[];
  @ApiProperty() total!: number;
}
