import {
  Body,
  Controller,
  Delete,
  Get,
  Header,
  HttpCode,
  Patch,
  Post,
  Put,
  Query,
  Res,
} from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiCreatedResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
} from '@nestjs/swagger';
import type { Response } from 'express';
import { CurrentUser, type AuthUser } from '../auth/auth-user.js';
import { ApiErrorDto } from '../http/api-error.dto.js';
import { RequirePermission } from '../http/require-permission.decorator.js';
import { IdParam } from '../stations/station-access.js';
import { CreateNetDto } from './dto/create-net.dto.js';
import {
  ExportQuery,
  ListNetsQuery,
  OverridesDto,
  PublishDto,
  ScheduleQuery,
} from './dto/schedule.dto.js';
import { UpdateNetDto } from './dto/update-net.dto.js';
import { NetsService } from './nets.service.js';

/**
 * Nets and their schedules. Reading needs nets:read (members see published versions only);
 * writing needs nets:manage (the net's controller or an admin).
 */
@ApiTags('nets')
@ApiBearerAuth()
@RequirePermission('nets:read')
@ApiBadRequestResponse({ type: ApiErrorDto, description: 'Invalid input; names the field' })
@ApiNotFoundResponse({ type: ApiErrorDto, description: 'No such net visible to you' })
@Controller('nets')
export class NetsController {
  constructor(private readonly nets: NetsService) {}

  @Get()
  @ApiOperation({ summary: 'Nets you control or belong to (all for an admin)' })
  list(@CurrentUser() user: AuthUser, @Query() q: ListNetsQuery) {
    return this.nets.list(user, q);
  }

  @Post()
  @RequirePermission('nets:manage')
  @ApiCreatedResponse({ description: 'The created net' })
  create(@CurrentUser() user: AuthUser, @Body() dto: CreateNetDto) {
    return this.nets.create(user, dto);
  }

  @Get(':id')
  get(@CurrentUser() user: AuthUser, @IdParam() id: number) {
    return this.nets.get(user, id);
  }

  @Patch(':id')
  @RequirePermission('nets:manage')
  update(@CurrentUser() user: AuthUser, @IdParam() id: number, @Body() dto: UpdateNetDto) {
    return this.nets.update(user, id, dto);
  }

  @Delete(':id')
  @HttpCode(204)
  @RequirePermission('nets:manage')
  remove(@CurrentUser() user: AuthUser, @IdParam() id: number) {
    this.nets.remove(user, id);
  }

  @Get(':id/schedule')
  @ApiOperation({
    summary: 'Draft schedule of a UTC day (controllers) and the latest published version',
    description:
      'Best channel per slot = the highest channel usable on all member paths at or below the lowest OWF. Predictions are estimates.',
  })
  @ApiOkResponse({ description: '{ draft: { slots } | null, published: version | null, … }' })
  schedule(@CurrentUser() user: AuthUser, @IdParam() id: number, @Query() q: ScheduleQuery) {
    return this.nets.schedule(user, id, q);
  }

  @Put(':id/schedule/overrides')
  @RequirePermission('nets:manage')
  @ApiOperation({ summary: 'Set (channel) or clear (null) the channel of draft slots' })
  overrides(@CurrentUser() user: AuthUser, @IdParam() id: number, @Body() dto: OverridesDto) {
    return this.nets.setOverrides(user, id, dto);
  }

  @Post(':id/publish')
  @RequirePermission('nets:manage')
  @ApiCreatedResponse({ description: 'The new immutable version' })
  publish(@CurrentUser() user: AuthUser, @IdParam() id: number, @Body() dto: PublishDto) {
    return this.nets.publish(user, id, dto);
  }

  @Get(':id/schedule.csv')
  @Header('content-type', 'text/csv; charset=utf-8')
  @ApiOperation({ summary: 'A published version as CSV (default the latest)' })
  csv(
    @CurrentUser() user: AuthUser,
    @IdParam() id: number,
    @Query() q: ExportQuery,
    @Res({ passthrough: true }) res: Response,
  ) {
    const { fileName, body } = this.nets.csv(user, id, q.version);
    res.setHeader('content-disposition', `attachment; filename="${fileName}"`);
    return body;
  }

  @Get(':id/schedule.ics')
  @Header('content-type', 'text/calendar; charset=utf-8')
  @ApiOperation({ summary: 'A published version as iCalendar events, one per channel change' })
  ics(
    @CurrentUser() user: AuthUser,
    @IdParam() id: number,
    @Query() q: ExportQuery,
    @Res({ passthrough: true }) res: Response,
  ) {
    const { fileName, body } = this.nets.ics(user, id, q.version);
    res.setHeader('content-disposition', `attachment; filename="${fileName}"`);
    return body;
  }
}
