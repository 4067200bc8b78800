import { ApiProperty } from '@nestjs/swagger';
import { IsInt, Min } from 'class-validator';
import { NAME_MAX, NameField } from '../../stations/dto/station-fields.js';

export class CreateLinkDto {
  @ApiProperty({ example: 'Ridge to Vale', minLength: 1, maxLength: NAME_MAX })
  @NameField()
  name!: string;

  @ApiProperty({ example: 1, description: 'A station of yours or a shared one' })
  @Min(1)
  @IsInt({ message: 'fromStationId must be an integer station id' })
  fromStationId!: number;

  @ApiProperty({ example: 2, description: 'A station of yours or a shared one; not fromStationId' })
  @Min(1)
  @IsInt({ message: 'toStationId must be an integer station id' })
  toStationId!: number;
}
