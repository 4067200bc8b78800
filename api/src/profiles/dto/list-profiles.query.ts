import { PROFILE_SOURCES, type ProfileSource } from '@hopwise/common';
import { ApiPropertyOptional } from '@nestjs/swagger';
import {
  IsBoolean,
  IsIn,
  IsInt,
  IsISO8601,
  IsOptional,
  IsString,
  Matches,
  Max,
  Min,
} from 'class-validator';
import { toBoolean, toNumber } from './profile-fields.js';

const NUMBER = String.raw`\s*[+-]?(\d+\.?\d*|\.\d+)\s*`;

export class ListProfilesQuery {
  @ApiPropertyOptional({ enum: PROFILE_SOURCES })
  @IsOptional()
  @IsIn(PROFILE_SOURCES, { message: `source must be one of: ${PROFILE_SOURCES.join(', ')}` })
  source?: ProfileSource;

  @ApiPropertyOptional()
  @IsOptional()
  @toNumber()
  @Min(1)
  @IsInt()
  ownerId?: number;

  @ApiPropertyOptional({ description: 'Only my own profiles' })
  @IsOptional()
  @toBoolean()
  @IsBoolean({ message: 'mine must be true or false' })
  mine?: boolean;

  @ApiPropertyOptional()
  @IsOptional()
  @toBoolean()
  @IsBoolean({ message: 'published must be true or false' })
  published?: boolean;

  @ApiPropertyOptional({ description: 'Valid time from (ISO 8601 UTC, inclusive)' })
  @IsOptional()
  @IsISO8601({ strict: true }, { message: 'from must be an ISO 8601 date-time' })
  from?: string;

  @ApiPropertyOptional({ description: 'Valid time to (ISO 8601 UTC, inclusive)' })
  @IsOptional()
  @IsISO8601({ strict: true }, { message: 'to must be an ISO 8601 date-time' })
  to?: string;

  @ApiPropertyOptional({
    description: 'minLon,minLat,maxLon,maxLat in degrees (minLon > maxLon crosses 180°)',
    example: '-10,40,20,60',
  })
  @IsOptional()
  @Matches(new RegExp(`^${NUMBER},${NUMBER},${NUMBER},${NUMBER}$`), {
    message: 'bbox must be minLon,minLat,maxLon,maxLat',
  })
  @IsString()
  bbox?: string;

  @ApiPropertyOptional({ description: 'Include the profile itself in each item' })
  @IsOptional()
  @toBoolean()
  @IsBoolean({ message: 'full must be true or false' })
  full?: boolean;

  @ApiPropertyOptional({ default: 50, minimum: 1, maximum: 500 })
  @IsOptional()
  @toNumber()
  @Max(500)
  @Min(1)
  @IsInt()
  limit?: number;

  @ApiPropertyOptional({ default: 0, minimum: 0 })
  @IsOptional()
  @toNumber()
  @Min(0)
  @IsInt()
  offset?: number;
}
