import type { ListResponse, ProfileCompareResponse, ProfileView } from '@hopwise/common';
import {
  Body,
  Controller,
  Delete,
  Get,
  HttpCode,
  Param,
  ParseIntPipe,
  Patch,
  Post,
  Query,
  Res,
  UploadedFile,
} from '@nestjs/common';
import {
  ApiBearerAuth,
  ApiBody,
  type ApiBodyOptions,
  ApiConsumes,
  ApiCreatedResponse,
  ApiNoContentResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiPayloadTooLargeResponse,
  ApiProduces,
  ApiTags,
  ApiUnsupportedMediaTypeResponse,
} from '@nestjs/swagger';
import type { Response } from 'express';
import { CurrentUser, type AuthUser } from '../auth/auth-user.js';
import { badRequest } from '../http/api-error.js';
import { ApiErrorDto } from '../http/api-error.dto.js';
import { RequirePermission } from '../http/require-permission.decorator.js';
import { CompareProfilesDto, CompareProfilesQuery } from './dto/compare-profiles.dto.js';
import { CreateProfileDto } from './dto/create-profile.dto.js';
import { ListProfilesQuery } from './dto/list-profiles.query.js';
import { UpdateProfileDto } from './dto/update-profile.dto.js';
import { UploadProfileDto } from './dto/upload-profile.dto.js';
import { ProfileCompareService } from './profile-compare.service.js';
import { ProfilesService } from './profiles.service.js';
import { AcceptUpload, type UploadedFileLike } from './upload/upload-file.js';

/** `:id` as an integer, else 400 naming `id`. */
export function IdParam(): ParameterDecorator {
  return Param(
    'id',
    new ParseIntPipe({
      exceptionFactory: () => badRequest('id must be an integer', { id: 'must be an integer' }),
    }),
  );
}

const UPLOAD_BODY: ApiBodyOptions = {
  schema: {
    type: 'object',
    required: ['file'],
    properties: {
      file: { type: 'string', format: 'binary', description: 'CSV or JSON of samples, ≤ 2 MB' },
      name: { type: 'string' },
      validAtUtc: { type: 'string', format: 'date-time' },
      latDeg: { type: 'number' },
      lonDeg: { type: 'number' },
    },
  },
};

@ApiTags('profiles')
@ApiBearerAuth()
@RequirePermission('profiles:read')
@Controller('profiles')
export class ProfilesController {
  constructor(
    private readonly profiles: ProfilesService,
    private readonly comparison: ProfileCompareService,
  ) {}

  @Get()
  @ApiOperation({
    summary: 'Profiles I may see (own, published; admin all), newest valid time first',
  })
  list(
    @CurrentUser() user: AuthUser,
    @Query() query: ListProfilesQuery,
  ): ListResponse<ProfileView> {
    return this.profiles.list(user, query);
  }

  @Post()
  @RequirePermission('profiles:write')
  @ApiCreatedResponse({ description: 'The stored profile with its derived figures' })
  create(@CurrentUser() user: AuthUser, @Body() dto: CreateProfileDto): ProfileView {
    return this.profiles.create(user, dto);
  }

  @Post('upload')
  @RequirePermission('profiles:write')
  @AcceptUpload()
  @ApiConsumes('multipart/form-data')
  @ApiBody(UPLOAD_BODY)
  @ApiOperation({
    summary: 'Upload a samples file (CSV or JSON)',
    description:
      'CSV header `heightKm,electronDensityPerM3` or `heightKm,plasmaFrequencyMHz`; `#` comments. ' +
      '400 lists every bad row in `rows: [{ row, line, column, reason, detail }]` and stores nothing.',
  })
  @ApiPayloadTooLargeResponse({ type: ApiErrorDto, description: 'File larger than 2 MB' })
  @ApiUnsupportedMediaTypeResponse({ type: ApiErrorDto, description: 'Not CSV or JSON' })
  upload(
    @CurrentUser() user: AuthUser,
    @UploadedFile() file: UploadedFileLike | undefined,
    @Body() dto: UploadProfileDto,
  ): ProfileView {
    return this.profiles.upload(user, file, dto);
  }

  @Post('compare')
  @HttpCode(200)
  @ApiOperation({ summary: 'Compare 2–4 profiles: peaks, thickness, TEC, MUF and delay per range' })
  compare(@CurrentUser() user: AuthUser, @Body() dto: CompareProfilesDto): ProfileCompareResponse {
    return this.comparison.compare(user, dto);
  }

  @Get('compare.csv')
  @ApiProduces('text/csv')
  @ApiOperation({ summary: 'The comparison as CSV (one line per profile and ground range)' })
  compareCsv(
    @CurrentUser() user: AuthUser,
    @Query() query: CompareProfilesQuery,
    @Res({ passthrough: true }) res: Response,
  ): string {
    const csv = this.comparison.compareCsv(user, query);
    // Set only on success, so that errors keep the JSON error shape.
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', 'attachment; filename="profile-comparison.csv"');
    return csv;
  }

  @Get(':id')
  @ApiNotFoundResponse({ type: ApiErrorDto })
  get(@CurrentUser() user: AuthUser, @IdParam() id: number): ProfileView {
    return this.profiles.get(user, id);
  }

  @Patch(':id')
  @RequirePermission('profiles:write')
  @ApiOkResponse({ description: 'The updated profile' })
  @ApiNotFoundResponse({ type: ApiErrorDto })
  update(
    @CurrentUser() user: AuthUser,
    @IdParam() id: number,
    @Body() dto: UpdateProfileDto,
  ): ProfileView {
    return this.profiles.update(user, id, dto);
  }

  @Delete(':id')
  @HttpCode(204)
  @RequirePermission('profiles:write')
  @ApiNoContentResponse({ description: 'Soft-deleted' })
  remove(@CurrentUser() user: AuthUser, @IdParam() id: number): void {
    this.profiles.remove(user, id);
  }

  @Post(':id/publish')
  @HttpCode(200)
  @RequirePermission('profiles:publish')
  publish(@CurrentUser() user: AuthUser, @IdParam() id: number): ProfileView {
    return this.profiles.setPublished(user, id, true);
  }

  @Post(':id/unpublish')
  @HttpCode(200)
  @RequirePermission('profiles:publish')
  unpublish(@CurrentUser() user: AuthUser, @IdParam() id: number): ProfileView {
    return this.profiles.setPublished(user, id, false);
  }
}
