import type { ListResponse, StationView } from '@hopwise/common';
import { Body, Controller, Delete, Get, HttpCode, Patch, Post, Query } from '@nestjs/common';
import {
  ApiBearerAuth,
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiForbiddenResponse,
  ApiNoContentResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiTags,
} from '@nestjs/swagger';
import { CurrentUser, type AuthUser } from '../auth/auth-user.js';
import { ApiErrorDto } from '../http/api-error.dto.js';
import { RequirePermission } from '../http/require-permission.decorator.js';
import { CreateStationDto } from './dto/create-station.dto.js';
import { ListStationsQuery } from './dto/list-stations.query.js';
import { StationListDto, StationViewDto } from './dto/station-view.dto.js';
import { UpdateStationDto } from './dto/update-station.dto.js';
import { IdParam } from './station-access.js';
import { StationsService } from './stations.service.js';

/**
 * Stations: own + shared ones visible (all for an admin); only the owner or an admin changes one.
 * Another user's private station answers 404; another user's shared station answers 403 to
 * PATCH/DELETE.
 */
@ApiTags('stations')
@ApiBearerAuth()
@RequirePermission('stations:use')
@Controller('stations')
export class StationsController {
  constructor(private readonly stations: StationsService) {}

  @Get()
  @ApiOkResponse({ type: StationListDto })
  list(
    @CurrentUser() user: AuthUser,
    @Query() query: ListStationsQuery,
  ): ListResponse<StationView> {
    return this.stations.list(user, query);
  }

  @Post()
  @ApiCreatedResponse({ type: StationViewDto })
  @ApiConflictResponse({ type: ApiErrorDto, description: 'Name already used by one of yours' })
  create(@CurrentUser() user: AuthUser, @Body() dto: CreateStationDto): StationView {
    return this.stations.create(user, dto);
  }

  @Get(':id')
  @ApiOkResponse({ type: StationViewDto })
  @ApiNotFoundResponse({ type: ApiErrorDto })
  get(@CurrentUser() user: AuthUser, @IdParam() id: number): StationView {
    return this.stations.get(user, id);
  }

  @Patch(':id')
  @ApiOkResponse({ type: StationViewDto })
  @ApiNotFoundResponse({ type: ApiErrorDto })
  @ApiForbiddenResponse({ type: ApiErrorDto, description: 'Another user’s shared station' })
  @ApiConflictResponse({ type: ApiErrorDto, description: 'Name taken, or un-sharing a used one' })
  update(
    @CurrentUser() user: AuthUser,
    @IdParam() id: number,
    @Body() dto: UpdateStationDto,
  ): StationView {
    return this.stations.update(user, id, dto);
  }

  @Delete(':id')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'Deleted (soft)' })
  @ApiNotFoundResponse({ type: ApiErrorDto })
  @ApiForbiddenResponse({ type: ApiErrorDto, description: 'Another user’s shared station' })
  @ApiConflictResponse({ type: ApiErrorDto, description: 'A live link uses the station' })
  remove(@CurrentUser() user: AuthUser, @IdParam() id: number): void {
    this.stations.remove(user, id);
  }
}
