import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsIn,
  IsInt,
  IsISO8601,
  IsOptional,
  Matches,
  Max,
  Min,
  ValidateIf,
  ValidateNested,
} from 'class-validator';
import { PageQuery } from '../../stations/dto/page.query.js';

const DATE_RE = /^\d{4}-\d{2}-\d{2}$/;

export class ScheduleQuery {
  @ApiPropertyOptional({ example: '2026-03-20', description: 'UTC day (default today)' })
  @IsOptional()
  @Matches(DATE_RE, { message: 'dateUtc must be an ISO date YYYY-MM-DD' })
  dateUtc?: string;

  @ApiPropertyOptional({ description: "'model' (default), 'feed', or a stored profile id" })
  @IsOptional()
  @Matches(/^(model|feed|\d+)$/, {
    message: "profileSource must be 'model', 'feed' or a profile id",
  })
  profileSource?: string;

  @ApiPropertyOptional({ enum: [15, 30, 60], default: 60 })
  @IsOptional()
  @Type(() => Number)
  @IsIn([15, 30, 60], { message: 'slotMinutes must be 15, 30 or 60' })
  slotMinutes?: number;
}

export class ExportQuery {
  @ApiPropertyOptional({ description: 'A published version (default the latest)' })
  @IsOptional()
  @Type(() => Number)
  @Min(1)
  @IsInt({ message: 'version must be an integer' })
  version?: number;
}

export class OverrideSlotDto {
  @ApiProperty({ example: '2026-03-20T06:00:00.000Z' })
  @IsISO8601({ strict: true }, { message: 'startUtc must be an ISO 8601 time' })
  startUtc!: string;

  @ApiProperty({
    nullable: true,
    description: 'One of the net’s channels [kHz]; null clears the override',
  })
  @ValidateIf((_o, v) => v !== null)
  @IsInt({ message: 'channelKHz must be an integer number of kHz or null' })
  @Min(3000, { message: 'channelKHz must be from 3000 to 30000 kHz' })
  @Max(30000, { message: 'channelKHz must be from 3000 to 30000 kHz' })
  channelKHz!: number | null;
}

export class OverridesDto {
  @ApiProperty({ type: [OverrideSlotDto] })
  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(96 * 7)
  @ValidateNested({ each: true })
  @Type(() => OverrideSlotDto)
  slots!: OverrideSlotDto[];
}

export class PublishDto {
  @ApiProperty({ example: '2026-03-20' })
  @Matches(DATE_RE, { message: 'dateUtc must be an ISO date YYYY-MM-DD' })
  dateUtc!: string;

  @ApiPropertyOptional({ description: "'model' (default), 'feed', or a stored profile id" })
  @IsOptional()
  @Matches(/^(model|feed|\d+)$/, {
    message: "profileSource must be 'model', 'feed' or a profile id",
  })
  profileSource?: string;

  @ApiPropertyOptional({ enum: [15, 30, 60], default: 60 })
  @IsOptional()
  @IsIn([15, 30, 60], { message: 'slotMinutes must be 15, 30 or 60' })
  slotMinutes?: number;
}

export class ListNetsQuery extends PageQuery {}
