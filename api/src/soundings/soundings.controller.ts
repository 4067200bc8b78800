import type { ListResponse, ProfileView, SoundingView } from '@hopwise/common';
import {
  Body,
  Controller,
  Delete,
  Get,
  HttpCode,
  Patch,
  Post,
  Query,
  UploadedFile,
} from '@nestjs/common';
import {
  ApiBearerAuth,
  ApiBody,
  ApiConsumes,
  ApiCreatedResponse,
  ApiNoContentResponse,
  ApiNotFoundResponse,
  ApiOperation,
  ApiPayloadTooLargeResponse,
  ApiTags,
  ApiUnprocessableEntityResponse,
  ApiUnsupportedMediaTypeResponse,
} from '@nestjs/swagger';
import { CurrentUser, type AuthUser } from '../auth/auth-user.js';
import { ApiErrorDto } from '../http/api-error.dto.js';
import { RequirePermission } from '../http/require-permission.decorator.js';
import { IdParam } from '../profiles/profiles.controller.js';
import { AcceptUpload, type UploadedFileLike } from '../profiles/upload/upload-file.js';
import { CreateSoundingDto } from './dto/create-sounding.dto.js';
import { InvertSoundingDto } from './dto/invert-sounding.dto.js';
import { ListSoundingsQuery } from './dto/list-soundings.query.js';
import { UpdateSoundingDto } from './dto/update-sounding.dto.js';
import { UploadSoundingDto } from './dto/upload-sounding.dto.js';
import { SoundingsService } from './soundings.service.js';

@ApiTags('soundings')
@ApiBearerAuth()
@RequirePermission('profiles:read')
@Controller('soundings')
export class SoundingsController {
  constructor(private readonly soundings: SoundingsService) {}

  @Get()
  @ApiOperation({ summary: 'My soundings (admin: all), latest observation first' })
  list(
    @CurrentUser() user: AuthUser,
    @Query() query: ListSoundingsQuery,
  ): ListResponse<SoundingView> {
    return this.soundings.list(user, query);
  }

  @Post()
  @RequirePermission('profiles:write')
  @ApiCreatedResponse({ description: 'The stored sounding with its trace' })
  create(@CurrentUser() user: AuthUser, @Body() dto: CreateSoundingDto): SoundingView {
    return this.soundings.create(user, dto);
  }

  @Post('upload')
  @RequirePermission('profiles:write')
  @AcceptUpload()
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: ['file', 'observedAtUtc', 'latDeg', 'lonDeg'],
      properties: {
        file: { type: 'string', format: 'binary', description: 'CSV or JSON trace, ≤ 2 MB' },
        name: { type: 'string' },
        observedAtUtc: { type: 'string', format: 'date-time' },
        latDeg: { type: 'number' },
        lonDeg: { type: 'number' },
      },
    },
  })
  @ApiOperation({
    summary: 'Upload a sounding trace (CSV `frequencyMHz,virtualHeightKm` or JSON)',
    description: '400 lists every bad row in `rows` and stores nothing.',
  })
  @ApiPayloadTooLargeResponse({ type: ApiErrorDto })
  @ApiUnsupportedMediaTypeResponse({ type: ApiErrorDto })
  upload(
    @CurrentUser() user: AuthUser,
    @UploadedFile() file: UploadedFileLike | undefined,
    @Body() dto: UploadSoundingDto,
  ): SoundingView {
    return this.soundings.upload(user, file, dto);
  }

  @Get(':id')
  @ApiNotFoundResponse({ type: ApiErrorDto })
  get(@CurrentUser() user: AuthUser, @IdParam() id: number): SoundingView {
    return this.soundings.get(user, id);
  }

  @Patch(':id')
  @RequirePermission('profiles:write')
  update(
    @CurrentUser() user: AuthUser,
    @IdParam() id: number,
    @Body() dto: UpdateSoundingDto,
  ): SoundingView {
    return this.soundings.update(user, id, dto);
  }

  @Delete(':id')
  @HttpCode(204)
  @RequirePermission('profiles:write')
  @ApiNoContentResponse({ description: 'Soft-deleted' })
  remove(@CurrentUser() user: AuthUser, @IdParam() id: number): void {
    this.soundings.remove(user, id);
  }

  @Post(':id/invert')
  @RequirePermission('profiles:write')
  @ApiOperation({ summary: 'Invert the trace to a true-height profile and store it' })
  @ApiCreatedResponse({ description: 'The stored profile (source "inversion")' })
  @ApiUnprocessableEntityResponse({ type: ApiErrorDto, description: 'Trace cannot be inverted' })
  invert(
    @CurrentUser() user: AuthUser,
    @IdParam() id: number,
    @Body() dto: InvertSoundingDto,
  ): ProfileView {
    return this.soundings.invert(user, id, dto);
  }
}
