import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsInt, IsOptional, Max, Min } from 'class-validator';
import { toBoolean, toNumber } from '../../profiles/dto/profile-fields.js';

export class ListSoundingsQuery {
  @ApiPropertyOptional({ description: 'Admins: only this owner' })
  @IsOptional()
  @toNumber()
  @Min(1)
  @IsInt()
  ownerId?: number;

  @ApiPropertyOptional({ description: 'Include the trace in each item' })
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
