import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsInt, IsOptional, Min } from 'class-validator';
import { NAME_MAX, NameField } from '../../stations/dto/station-fields.js';
import { ChannelsField, MembersField } from './net-fields.js';

export class UpdateNetDto {
  @ApiPropertyOptional({ minLength: 1, maxLength: NAME_MAX })
  @IsOptional()
  @NameField()
  name?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @Min(1)
  @IsInt({ message: 'controlStationId must be an integer station id' })
  controlStationId?: number;

  @ApiPropertyOptional({ type: [Number] })
  @IsOptional()
  @MembersField()
  memberStationIds?: number[];

  @ApiPropertyOptional({ type: [Number] })
  @IsOptional()
  @ChannelsField()
  channelsKHz?: number[];
}
