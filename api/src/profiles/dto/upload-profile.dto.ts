import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsISO8601, IsNumber, IsOptional, IsString, Length, Max, Min } from 'class-validator';
import { toNumber, trim } from './profile-fields.js';

/** Form fields sent beside the file (multipart text fields arrive as strings). */
export class UploadProfileDto {
  @ApiPropertyOptional({ description: 'Defaults to the file name', maxLength: 120 })
  @IsOptional()
  @Transform(trim)
  @Length(1, 120)
  @IsString()
  name?: string;

  @ApiPropertyOptional({ description: 'ISO 8601 UTC' })
  @IsOptional()
  @Transform(({ value }: { value: unknown }) => (value === '' ? undefined : value))
  @IsISO8601({ strict: true }, { message: 'validAtUtc must be an ISO 8601 date-time' })
  validAtUtc?: string;

  @ApiPropertyOptional({ minimum: -90, maximum: 90 })
  @IsOptional()
  @toNumber()
  @Max(90)
  @Min(-90)
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'latDeg must be a number' })
  latDeg?: number;

  @ApiPropertyOptional({ minimum: -180, maximum: 180 })
  @IsOptional()
  @toNumber()
  @Max(180)
  @Min(-180)
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'lonDeg must be a number' })
  lonDeg?: number;
}
