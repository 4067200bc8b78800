import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, IsOptional, Min } from 'class-validator';
import { PageQuery } from '../../stations/dto/page.query.js';

export class ListLinksQuery extends PageQuery {
  @ApiPropertyOptional({ description: 'Only links from or to this station' })
  @IsOptional()
  @Type(() => Number)
  @Min(1)
  @IsInt()
  stationId?: number;
}
