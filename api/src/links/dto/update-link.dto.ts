import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsInt, Min, ValidateIf } from 'class-validator';
import { NAME_MAX, NameField } from '../../stations/dto/station-fields.js';

const given = (key: string) => (o: object) => (o as Record<string, unknown>)[key] !== undefined;

export class UpdateLinkDto {
  @ApiPropertyOptional({ minLength: 1, maxLength: NAME_MAX })
  @ValidateIf(given('name'))
  @NameField()
  name?: string;

  @ApiPropertyOptional()
  @ValidateIf(given('fromStationId'))
  @Min(1)
  @IsInt({ message: 'fromStationId must be an integer station id' })
  fromStationId?: number;

  @ApiPropertyOptional()
  @ValidateIf(given('toStationId'))
  @Min(1)
  @IsInt({ message: 'toStationId must be an integer station id' })
  toStationId?: number;
}
