import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsBoolean, IsOptional, IsString, MaxLength } from 'class-validator';
import { PageQuery } from './page.query.js';

/** `true`/`false` (also 1/0) from the query string; anything else stays as is and fails IsBoolean. */
export const queryBoolean = ({ value }: { value: unknown }) =>
  value === 'true' || value === '1' ? true : value === 'false' || value === '0' ? false : value;

export class ListStationsQuery extends PageQuery {
  @ApiPropertyOptional({ description: 'Part of the name or call sign (case-insensitive)' })
  @IsOptional()
  @Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value))
  @MaxLength(80)
  @IsString()
  q?: string;

  @ApiPropertyOptional({ description: 'Only my own stations (not others’ shared ones)' })
  @IsOptional()
  @Transform(queryBoolean)
  @IsBoolean({ message: 'mine must be true or false' })
  mine?: boolean;
}
