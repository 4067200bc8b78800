import type { TracePoint } from '@hopwise/common';
import { ApiProperty } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsArray, IsISO8601, IsNumber, IsString, Length, Max, Min } from 'class-validator';
import { trim } from '../../profiles/dto/profile-fields.js';

export class CreateSoundingDto {
  @ApiProperty({ example: 'Harrow Sound 13:00 UTC', maxLength: 120 })
  @Transform(trim)
  @Length(1, 120)
  @IsString()
  name!: string;

  @ApiProperty({ description: 'ISO 8601 UTC', example: '2026-03-18T13:00:00Z' })
  @IsISO8601({ strict: true }, { message: 'observedAtUtc must be an ISO 8601 date-time' })
  observedAtUtc!: string;

  @ApiProperty({ minimum: -90, maximum: 90 })
  @Max(90)
  @Min(-90)
  @IsNumber({ allowNaN: false, allowInfinity: false })
  latDeg!: number;

  @ApiProperty({ minimum: -180, maximum: 180 })
  @Max(180)
  @Min(-180)
  @IsNumber({ allowNaN: false, allowInfinity: false })
  lonDeg!: number;

  @ApiProperty({
    description:
      'Vertical-incidence trace, ≥ 5 points, frequency ascending (0.1–100 MHz), 0 < h′ < 5000 km',
    example: [
      { frequencyMHz: 2, virtualHeightKm: 203.7 },
      { frequencyMHz: 3, virtualHeightKm: 221.4 },
    ],
  })
  @IsArray({ message: 'trace must be an array of { frequencyMHz, virtualHeightKm }' })
  trace!: TracePoint[];
}
