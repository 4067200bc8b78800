import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsOptional, ValidateIf } from 'class-validator';
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

const given = (key: string) => (o: object) => (o as Record<string, unknown>)[key] !== undefined;

/** Every field optional; `null` clears callSign, elevationM and notes (the others cannot be null). */
export class UpdateStationDto {
  @ApiPropertyOptional({ minLength: 1, maxLength: NAME_MAX })
  @ValidateIf(given('name'))
  @NameField()
  name?: string;

  @ApiPropertyOptional({ nullable: true })
  @IsOptional()
  @CallSignField()
  callSign?: string | null;

  @ApiPropertyOptional({ minimum: -90, maximum: 90 })
  @ValidateIf(given('latDeg'))
  @LatField()
  latDeg?: number;

  @ApiPropertyOptional({ minimum: -180, maximum: 180 })
  @ValidateIf(given('lonDeg'))
  @LonField()
  lonDeg?: number;

  @ApiPropertyOptional({ minimum: -500, maximum: 9000, nullable: true })
  @IsOptional()
  @ElevationField()
  elevationM?: number | null;

  @ApiPropertyOptional({ maxLength: NOTES_MAX, nullable: true })
  @IsOptional()
  @NotesField()
  notes?: string | null;

  @ApiPropertyOptional()
  @ValidateIf(given('shared'))
  @IsBoolean()
  shared?: boolean;
}
