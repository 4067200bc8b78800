import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsBoolean, IsOptional } from 'class-validator';
import { PageQuery } from '../../stations/dto/page.query.js';

export class ListNoticesQuery extends PageQuery {
  @ApiPropertyOptional({ description: 'Only notices not yet read' })
  @IsOptional()
  @Transform(({ value }: { value: unknown }) =>
    value === 'true' || value === '1' ? true : value === 'false' || value === '0' ? false : value,
  )
  @IsBoolean({ message: 'unread must be true or false' })
  unread?: boolean;
}
