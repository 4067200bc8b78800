import { ApiProperty } from '@nestjs/swagger';
import { IsInt, Min } from 'class-validator';
import { NAME_MAX, NameField } from '../../stations/dto/station-fields.js';
import { ChannelsField, MembersField } from './net-fields.js';

export class CreateNetDto {
  @ApiProperty({ example: 'Harrow evening net', minLength: 1, maxLength: NAME_MAX })
  @NameField()
  name!: string;

  @ApiProperty({ example: 1, description: 'A station of yours or a shared one' })
  @Min(1)
  @IsInt({ message: 'controlStationId must be an integer station id' })
  controlStationId!: number;

  @ApiProperty({ type: [Number], example: [3], description: 'Stations of yours or shared ones' })
  @MembersField()
  memberStationIds!: number[];

  @ApiProperty({
    type: [Number],
    example: [3615, 5290, 7045, 9120],
    description: 'kHz, 3000–30000',
  })
  @ChannelsField()
  channelsKHz!: number[];
}
