import type { LinkView } from '@hopwise/common';
import { ApiProperty } from '@nestjs/swagger';
import { StationViewDto } from '../../stations/dto/station-view.dto.js';

export class GeoPointDto {
  @ApiProperty({ example: 49.4 }) latDeg!: number;
  @ApiProperty({ example: 3.86 }) lonDeg!: number;
}

export class LinkViewDto implements LinkView {
  @ApiProperty() id!: number;
  @ApiProperty() ownerId!: number;
  @ApiProperty() ownerName!: string;
  @ApiProperty({ example: 'Ridge to Vale' }) name!: string;
  @ApiProperty() fromStationId!: number;
  @ApiProperty() toStationId!: number;
  @ApiProperty({ type: StationViewDto }) fromStation!: StationViewDto;
  @ApiProperty({ type: StationViewDto }) toStation!: StationViewDto;
  @ApiProperty({ description: 'Great-circle distance on the sphere R₀ = 6371 km [km]' })
  distanceKm!: number;
  @ApiProperty({ description: 'WGS-84 geodesic distance [km]' }) geodesicDistanceKm!: number;
  @ApiProperty({ description: 'Initial bearing from → to [deg from true north]' })
  bearingDeg!: number;
  @ApiProperty({ description: 'Initial bearing to → from [deg]' }) reverseBearingDeg!: number;
  @ApiProperty({ type: GeoPointDto, description: 'Great-circle midpoint (control point)' })
  midpoint!: GeoPointDto;
  @ApiProperty() createdAt!: string;
  @ApiProperty() updatedAt!: string;
}

export class LinkListDto {
  @ApiProperty({ type: [LinkViewDto] }) items!: LinkViewDto[];
  @ApiProperty() total!: number;
}
