import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsOptional, IsString, MaxLength } from 'class-validator';
import { trimToNull } from '../../stations/dto/station-fields.js';

/** Only the name of a study changes; a different computation is a new study. */
export class UpdateStudyDto {
  @ApiPropertyOptional({ nullable: true, maxLength: 80, description: 'null or blank clears it' })
  @IsOptional()
  @Transform(trimToNull)
  @MaxLength(80)
  @IsString()
  name?: string | null;
}
