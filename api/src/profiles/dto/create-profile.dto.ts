import type { ProfileData } from '@hopwise/common';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import {
  IsBoolean,
  IsISO8601,
  IsNumber,
  IsObject,
  IsOptional,
  IsString,
  Length,
  Max,
  Min,
} from 'class-validator';
import { trim } from './profile-fields.js';

export class CreateProfileDto {
  @ApiProperty({ example: 'Quiet day, mid-latitude', maxLength: 120 })
  @Transform(trim)
  @Length(1, 120)
  @IsString()
  name!: string;

  @ApiPropertyOptional({ description: 'ISO 8601 UTC', example: '2026-03-18T13:00:00Z' })
  @IsOptional()
  @IsISO8601({ strict: true }, { message: 'validAtUtc must be an ISO 8601 date-time' })
  validAtUtc?: string | null;

  @ApiPropertyOptional({ minimum: -90, maximum: 90 })
  @IsOptional()
  @Max(90)
  @Min(-90)
  @IsNumber({ allowNaN: false, allowInfinity: false })
  latDeg?: number | null;

  @ApiPropertyOptional({ minimum: -180, maximum: 180 })
  @IsOptional()
  @Max(180)
  @Min(-180)
  @IsNumber({ allowNaN: false, allowInfinity: false })
  lonDeg?: number | null;

  @ApiProperty({
    description:
      'A ProfileInput with `layers` or `samples` (SPEC §2.1), validated by the physics core',
    example: {
      layers: [
        {
          name: 'F2',
          shape: 'chapman',
          criticalFrequencyMHz: 9.2,
          peakHeightKm: 310,
          scaleHeightKm: 55,
        },
      ],
    },
  })
  @IsObject({ message: 'profile must be an object with layers or samples' })
  profile!: ProfileData;

  @ApiPropertyOptional({ default: false, description: 'Needs profiles:publish' })
  @IsOptional()
  @IsBoolean()
  published?: boolean;
}
