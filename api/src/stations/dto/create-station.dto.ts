import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsOptional } from 'class-validator';
import {
  CallSignField,
  ElevationField,
  LatField,
  LonField,
  NameField,
  NotesField,
  NAME_MAX,
  NOTES_MAX,
} from './station-fields.js';

export class CreateStationDto {
  @ApiProperty({ example: 'Harrow Ridge relay', minLength: 1, maxLength: NAME_MAX })
  @NameField()
  name!: string;

  @ApiPropertyOptional({
    example: 'X1HRW',
    nullable: true,
    description: '3–12 of A–Z, 0–9, / (upper-cased; blank clears)',
  })
  @IsOptional()
  @CallSignField()
  callSign?: string | null;

  @ApiProperty({ example: 47.2, minimum: -90, maximum: 90, description: 'degrees, north +' })
  @LatField()
  latDeg!: number;

  @ApiProperty({ example: 8.6, minimum: -180, maximum: 180, description: 'degrees, east +' })
  @LonField()
  lonDeg!: number;

  @ApiPropertyOptional({ example: 420, minimum: -500, maximum: 9000, nullable: true })
  @IsOptional()
  @ElevationField()
  elevationM?: number | null;

  @ApiPropertyOptional({ maxLength: NOTES_MAX, nullable: true })
  @IsOptional()
  @NotesField()
  notes?: string | null;

  @ApiPropertyOptional({ default: false, description: 'Visible to every user' })
  @IsOptional()
  @IsBoolean()
  shared?: boolean;
}
