import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsISO8601, IsNumber, IsOptional, IsString, Length, Max, Min } from 'class-validator';
import { toNumber, trim } from '../../profiles/dto/profile-fields.js';

/** Form fields sent beside the trace file (multipart text fields arrive as strings). */
export class UploadSoundingDto {
  @ApiPropertyOptional({ description: 'Defaults to the file name', maxLength: 120 })
  @IsOptional()
  @Transform(trim)
  @Length(1, 120)
  @IsString()
  name?: string;

  @ApiProperty({ description: 'ISO 8601 UTC' })
  @IsISO8601({ strict: true }, { message: 'observedAtUtc must be an ISO 8601 date-time' })
  observedAtUtc!: string;

  @ApiProperty({ minimum: -90, maximum: 90 })
  @toNumber()
  @Max(90)
  @Min(-90)
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'latDeg must be a number' })
  latDeg!: number;

  @ApiProperty({ minimum: -180, maximum: 180 })
  @toNumber()
  @Max(180)
  @Min(-180)
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'lonDeg must be a number' })
  lonDeg!: number;
}
