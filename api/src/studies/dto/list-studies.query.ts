import { ISO_DATE_TIME_WITH_ZONE } from '@hopwise/common';
import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import { IsBoolean, IsIn, IsInt, IsOptional, Matches, Min } from 'class-validator';
import { queryBoolean } from '../../stations/dto/list-stations.query.js';
import { PageQuery } from '../../stations/dto/page.query.js';

const ISO_MESSAGE = 'must be an ISO 8601 date-time with a zone, e.g. 2026-03-18T00:00:00Z';

export class ListStudiesQuery extends PageQuery {
  @ApiPropertyOptional({ description: 'Only studies of this link' })
  @IsOptional()
  @Type(() => Number)
  @Min(1)
  @IsInt()
  linkId?: number;

  @ApiPropertyOptional({ description: 'atUtc at or after (ISO 8601)' })
  @IsOptional()
  @Matches(ISO_DATE_TIME_WITH_ZONE, { message: `from ${ISO_MESSAGE}` })
  from?: string;

  @ApiPropertyOptional({ description: 'atUtc at or before (ISO 8601)' })
  @IsOptional()
  @Matches(ISO_DATE_TIME_WITH_ZONE, { message: `to ${ISO_MESSAGE}` })
  to?: string;

  @ApiPropertyOptional({ enum: ['atUtc', 'createdAt'], default: 'createdAt' })
  @IsOptional()
  @IsIn(['atUtc', 'createdAt'], { message: 'sort must be atUtc or createdAt' })
  sort?: 'atUtc' | 'createdAt';

  @ApiPropertyOptional({ enum: ['asc', 'desc'], default: 'desc' })
  @IsOptional()
  @IsIn(['asc', 'desc'], { message: 'order must be asc or desc' })
  order?: 'asc' | 'desc';

  @ApiPropertyOptional({
    description: 'Include the ray paths of every mode (large; GET /api/studies/{id} always does)',
  })
  @IsOptional()
  @Transform(queryBoolean)
  @IsBoolean({ message: 'full must be true or false' })
  full?: boolean;
}
