import type { LinkView, ListResponse } from '@hopwise/common';
import { Body, Controller, Delete, Get, HttpCode, Patch, Post, Query } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiNoContentResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiTags,
} from '@nestjs/swagger';
import { CurrentUser, type AuthUser } from '../auth/auth-user.js';
import { ApiErrorDto } from '../http/api-error.dto.js';
import { RequirePermission } from '../http/require-permission.decorator.js';
import { IdParam } from '../stations/station-access.js';
import { CreateLinkDto } from './dto/create-link.dto.js';
import { LinkListDto, LinkViewDto } from './dto/link-view.dto.js';
import { ListLinksQuery } from './dto/list-links.query.js';
import { UpdateLinkDto } from './dto/update-link.dto.js';
import { LinksService } from './links.service.js';

/** Links are private to their owner (an admin sees all); another user's link answers 404. */
@ApiTags('links')
@ApiBearerAuth()
@RequirePermission('stations:use')
@Controller('links')
export class LinksController {
  constructor(private readonly links: LinksService) {}

  @Get()
  @ApiOkResponse({ type: LinkListDto })
  list(@CurrentUser() user: AuthUser, @Query() query: ListLinksQuery): ListResponse<LinkView> {
    return this.links.list(user, query);
  }

  @Post()
  @ApiCreatedResponse({ type: LinkViewDto })
  @ApiBadRequestResponse({ type: ApiErrorDto, description: 'Unknown, invisible or equal stations' })
  @ApiConflictResponse({ type: ApiErrorDto, description: 'Name already used by one of yours' })
  create(@CurrentUser() user: AuthUser, @Body() dto: CreateLinkDto): LinkView {
    return this.links.create(user, dto);
  }

  @Get(':id')
  @ApiOkResponse({ type: LinkViewDto })
  @ApiNotFoundResponse({ type: ApiErrorDto })
  get(@CurrentUser() user: AuthUser, @IdParam() id: number): LinkView {
    return this.links.get(user, id);
  }

  @Patch(':id')
  @ApiOkResponse({ type: LinkViewDto })
  @ApiNotFoundResponse({ type: ApiErrorDto })
  update(
    @CurrentUser() user: AuthUser,
    @IdParam() id: number,
    @Body() dto: UpdateLinkDto,
  ): LinkView {
    return this.links.update(user, id, dto);
  }

  @Delete(':id')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'Deleted (soft), with its studies' })
  @ApiNotFoundResponse({ type: ApiErrorDto })
  remove(@CurrentUser() user: AuthUser, @IdParam() id: number): void {
    this.links.remove(user, id);
  }
}
