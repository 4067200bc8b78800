import type { LinkFollowView, NoticeListResponse, NoticeView } from '@hopwise/common';
import { Body, Controller, Delete, Get, HttpCode, Post, Query } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
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
import { FollowLinkDto } from './dto/follow-link.dto.js';
import { ListNoticesQuery } from './dto/list-notices.query.js';
import { EndpointDto, PushSubscriptionDto } from './dto/push-subscription.dto.js';
import { NoticesService } from './notices.service.js';

@ApiTags('notices')
@ApiBearerAuth()
@RequirePermission('notices:read')
@Controller('notices')
export class NoticesController {
  constructor(private readonly notices: NoticesService) {}

  @Get()
  @ApiOkResponse({ description: '{ items, total, unread } — your own notices, newest first' })
  list(@CurrentUser() user: AuthUser, @Query() query: ListNoticesQuery): NoticeListResponse {
    return this.notices.list(user, query);
  }

  @Get('unread-count')
  @ApiOkResponse({ description: '{ unread }' })
  unreadCount(@CurrentUser() user: AuthUser): { unread: number } {
    return this.notices.unreadCount(user);
  }

  @Post('read-all')
  @HttpCode(200)
  @ApiOkResponse({ description: '{ updated, unread: 0 }' })
  readAll(@CurrentUser() user: AuthUser) {
    return this.notices.markAllRead(user);
  }

  @Post(':id/read')
  @HttpCode(200)
  @ApiOkResponse({ description: 'The notice, now read' })
  @ApiNotFoundResponse({ type: ApiErrorDto })
  read(@CurrentUser() user: AuthUser, @IdParam() id: number): NoticeView {
    return this.notices.markRead(user, id);
  }

  @Get('push/public-key')
  @ApiOkResponse({ description: "{ publicKey } — the server's VAPID public key (base64url)" })
  publicKey(): { publicKey: string } {
    return this.notices.publicKey();
  }

  @Post('push/subscriptions')
  @ApiCreatedResponse({ description: '{ id, endpoint, createdAt }' })
  @ApiBadRequestResponse({ type: ApiErrorDto })
  subscribe(@CurrentUser() user: AuthUser, @Body() dto: PushSubscriptionDto) {
    return this.notices.subscribe(user, dto);
  }

  @Delete('push/subscriptions')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'Unsubscribed (?endpoint=<the subscription endpoint>)' })
  @ApiNotFoundResponse({ type: ApiErrorDto })
  unsubscribe(@CurrentUser() user: AuthUser, @Query() dto: EndpointDto): void {
    this.notices.unsubscribe(user, dto.endpoint);
  }
}

/** Following a link: the watch tells the user when the band moves under it. */
@ApiTags('notices')
@ApiBearerAuth()
@RequirePermission('notices:read', 'stations:use')
@Controller('links/:id/follow')
export class LinkFollowController {
  constructor(private readonly notices: NoticesService) {}

  @Get()
  @ApiOkResponse({ description: '{ linkId, following, channelsKHz, watchChannelKHz, createdAt }' })
  @ApiNotFoundResponse({ type: ApiErrorDto })
  get(@CurrentUser() user: AuthUser, @IdParam() id: number): LinkFollowView {
    return this.notices.getFollow(user, id);
  }

  @Post()
  @HttpCode(200)
  @ApiOkResponse({ description: 'Following (created or updated)' })
  @ApiBadRequestResponse({ type: ApiErrorDto })
  @ApiNotFoundResponse({ type: ApiErrorDto })
  follow(
    @CurrentUser() user: AuthUser,
    @IdParam() id: number,
    @Body() dto: FollowLinkDto,
  ): LinkFollowView {
    return this.notices.follow(user, id, dto);
  }

  @Delete()
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'No longer following' })
  @ApiNotFoundResponse({ type: ApiErrorDto })
  unfollow(@CurrentUser() user: AuthUser, @IdParam() id: number): void {
    this.notices.unfollow(user, id);
  }
}
