import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsOptional, IsString, Length } from 'class-validator';
import { trim } from '../../profiles/dto/profile-fields.js';

export class InvertSoundingDto {
  @ApiPropertyOptional({
    description: 'Name of the stored profile (default: "<sounding> (inverted)")',
  })
  @IsOptional()
  @Transform(trim)
  @Length(1, 120)
  @IsString()
  name?: string;
}
