import type { ListResponse, ReferenceProfileView, StudyView } from '@hopwise/common';
import {
  Body,
  Controller,
  Delete,
  Get,
  Header,
  HttpCode,
  Patch,
  Post,
  Query,
  Res,
} from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiBody,
  ApiCreatedResponse,
  ApiNoContentResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiProduces,
  ApiTags,
  ApiUnprocessableEntityResponse,
} from '@nestjs/swagger';
import type { Response } from 'express';
import { CurrentUser, type AuthUser } from '../auth/auth-user.js';
import { ApiErrorDto } from '../http/api-error.dto.js';
import { RequirePermission } from '../http/require-permission.decorator.js';
import { IdParam } from '../stations/station-access.js';
import { ListStudiesQuery } from './dto/list-studies.query.js';
import {
  CREATE_STUDY_SCHEMA,
  STUDY_CSV_DESCRIPTION,
  STUDY_LIST_SCHEMA,
  STUDY_SCHEMA,
} from './dto/study-docs.js';
import { UpdateStudyDto } from './dto/update-study.dto.js';
import { ReferenceProfiles } from './reference-profiles.js';
import { StudiesService } from './studies.service.js';

/** Saved link studies: private to their owner (an admin sees all); others' answer 404. */
@ApiTags('studies')
@ApiBearerAuth()
@RequirePermission('stations:use')
@Controller('studies')
export class StudiesController {
  constructor(private readonly studies: StudiesService) {}

  @Get()
  @ApiOkResponse({ schema: STUDY_LIST_SCHEMA })
  list(@CurrentUser() user: AuthUser, @Query() query: ListStudiesQuery): ListResponse<StudyView> {
    return this.studies.list(user, query);
  }

  /** The body is `unknown` so the class-validator pipe leaves it to the zod schema in common. */
  @Post()
  @ApiOperation({
    summary: 'Run and save a link study',
    description:
      'Runs the oblique computation for every frequency at the link’s great-circle distance with ' +
      'the chosen profile and stores the result. Nothing is stored on an error.',
  })
  @ApiBody({ schema: CREATE_STUDY_SCHEMA })
  @ApiCreatedResponse({ schema: STUDY_SCHEMA })
  @ApiBadRequestResponse({ type: ApiErrorDto, description: 'Malformed input; names the field' })
  @ApiUnprocessableEntityResponse({ type: ApiErrorDto, description: 'No physical answer' })
  create(@CurrentUser() user: AuthUser, @Body() body: unknown): Promise<StudyView> {
    return this.studies.create(user, body);
  }

  @Get(':id/export.csv')
  @ApiProduces('text/csv')
  @ApiOkResponse({ description: STUDY_CSV_DESCRIPTION })
  @ApiNotFoundResponse({ type: ApiErrorDto })
  exportCsv(
    @CurrentUser() user: AuthUser,
    @IdParam() id: number,
    @Res({ passthrough: true }) res: Response,
  ): string {
    const { filename, csv } = this.studies.exportCsv(user, id);
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', `attachment; filename="${filename}"`);
    return csv;
  }

  @Get(':id')
  @ApiOkResponse({ schema: STUDY_SCHEMA })
  @ApiNotFoundResponse({ type: ApiErrorDto })
  get(@CurrentUser() user: AuthUser, @IdParam() id: number): StudyView {
    return this.studies.get(user, id);
  }

  @Patch(':id')
  @ApiOkResponse({ schema: STUDY_SCHEMA })
  @ApiNotFoundResponse({ type: ApiErrorDto })
  update(
    @CurrentUser() user: AuthUser,
    @IdParam() id: number,
    @Body() dto: UpdateStudyDto,
  ): StudyView {
    return this.studies.update(user, id, dto);
  }

  @Delete(':id')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'Deleted (soft)' })
  @ApiNotFoundResponse({ type: ApiErrorDto })
  remove(@CurrentUser() user: AuthUser, @IdParam() id: number): void {
    this.studies.remove(user, id);
  }
}

/** `GET /api/links/:id/latest-study`: the most recently created study of a link (dashboard card). */
@ApiTags('studies')
@ApiBearerAuth()
@RequirePermission('stations:use')
@Controller('links')
export class LinkLatestStudyController {
  constructor(private readonly studies: StudiesService) {}

  @Get(':id/latest-study')
  @ApiOkResponse({ schema: STUDY_SCHEMA })
  @ApiNotFoundResponse({ type: ApiErrorDto, description: 'No such link, or no study of it yet' })
  latest(@CurrentUser() user: AuthUser, @IdParam() id: number): StudyView {
    return this.studies.latestOfLink(user, id);
  }
}

/** The read-only reference profiles of the repository's profiles/ folder (invented demo data). */
@ApiTags('studies')
@ApiBearerAuth()
@RequirePermission('stations:use')
@Controller('reference-profiles')
export class ReferenceProfilesController {
  constructor(private readonly references: ReferenceProfiles) {}

  @Get()
  @Header('Cache-Control', 'no-cache')
  @ApiOkResponse({
    description:
      '{ items: [{ key, name, description, validAtUtc, latDeg, lonDeg, profile }], total }',
  })
  list(): ListResponse<ReferenceProfileView> {
    const items = this.references.list();
    return { items, total: items.length };
  }
}
