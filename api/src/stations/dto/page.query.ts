import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, IsOptional, Max, Min } from 'class-validator';

export const DEFAULT_PAGE = 50;

/** `?limit=&offset=` of every list route. */
export class PageQuery {
  @ApiPropertyOptional({ default: DEFAULT_PAGE, minimum: 1, maximum: 500 })
  @IsOptional()
  @Type(() => Number)
  @Max(500)
  @Min(1)
  @IsInt()
  limit?: number;

  @ApiPropertyOptional({ default: 0, minimum: 0 })
  @IsOptional()
  @Type(() => Number)
  @Min(0)
  @IsInt()
  offset?: number;
}
