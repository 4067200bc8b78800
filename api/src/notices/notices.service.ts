import type { LinkFollowView, NoticeListResponse, NoticeView, UserView } from '@hopwise/common';
import { Injectable } from '@nestjs/common';
import { ApiException, badRequest } from '../http/api-error.js';
import { LinksService } from '../links/links.service.js';
import { VapidKeysService } from '../push/vapid-keys.service.js';
import { DEFAULT_PAGE } from '../stations/dto/page.query.js';
import type { FollowLinkDto } from './dto/follow-link.dto.js';
import type { PushSubscriptionDto } from './dto/push-subscription.dto.js';
import { toNoticeView } from './notice-view.js';
import { NoticesRepository } from './notices.repository.js';

const P256_PUBLIC_KEY_BYTES = 65; // uncompressed point 0x04‖X‖Y (SEC 1 §2.3.3)
const AUTH_SECRET_BYTES = 16; // RFC 8291 §3.2

/** A user's inbox, push subscriptions and link follows. Every query is scoped to the user. */
@Injectable()
export class NoticesService {
  constructor(
    private readonly repo: NoticesRepository,
    private readonly vapid: VapidKeysService,
    private readonly links: LinksService,
  ) {}

  list(
    user: UserView,
    query: { limit?: number; offset?: number; unread?: boolean },
  ): NoticeListResponse {
    const { rows, total, unread } = this.repo.list(user.id, {
      limit: query.limit ?? DEFAULT_PAGE,
      offset: query.offset ?? 0,
      unreadOnly: query.unread,
    });
    return { items: rows.map(toNoticeView), total, unread };
  }

  unreadCount(user: UserView): { unread: number } {
    return { unread: this.repo.unreadCount(user.id) };
  }

  /** Another user's notice answers 404, as if it did not exist. */
  markRead(user: UserView, id: number): NoticeView {
    const row = this.repo.markRead(user.id, id);
    if (!row) throw new ApiException(404, `Notice ${id} not found`);
    return toNoticeView(row);
  }

  markAllRead(user: UserView): { updated: number; unread: number } {
    const updated = this.repo.markAllRead(user.id);
    return { updated, unread: 0 };
  }

  publicKey(): { publicKey: string } {
    return { publicKey: this.vapid.get().publicKey };
  }

  subscribe(user: UserView, dto: PushSubscriptionDto) {
    const fields: Record<string, string> = {};
    if (Buffer.from(dto.keys.p256dh, 'base64url').length !== P256_PUBLIC_KEY_BYTES) {
      fields['keys.p256dh'] = `must decode to ${P256_PUBLIC_KEY_BYTES} bytes (a P-256 public key)`;
    }
    if (Buffer.from(dto.keys.auth, 'base64url').length !== AUTH_SECRET_BYTES) {
      fields['keys.auth'] = `must decode to ${AUTH_SECRET_BYTES} bytes`;
    }
    if (Object.keys(fields).length > 0) throw badRequest('Invalid push subscription keys', fields);
    const row = this.repo.savePushSubscription(user.id, dto.endpoint, {
      p256dh: dto.keys.p256dh,
      auth: dto.keys.auth,
    });
    return { id: row.id, endpoint: row.endpoint, createdAt: row.createdAt };
  }

  unsubscribe(user: UserView, endpoint: string): void {
    if (!this.repo.disablePushSubscription(user.id, endpoint)) {
      throw new ApiException(404, 'No active push subscription with this endpoint', {
        endpoint: 'not subscribed',
      });
    }
  }

  // ----- link follows (the link must be visible to the user: own, or any for an admin) -----

  private requireLink(user: UserView, linkId: number): void {
    if (!this.links.findVisible(user, linkId)) {
      throw new ApiException(404, `Link ${linkId} not found`);
    }
  }

  getFollow(user: UserView, linkId: number): LinkFollowView {
    this.requireLink(user, linkId);
    const row = this.repo.findFollow(user.id, linkId);
    return {
      linkId,
      following: row !== undefined,
      channelsKHz: row?.channelsKHz ?? [],
      watchChannelKHz: row?.watchChannelKHz ?? null,
      createdAt: row?.createdAt ?? null,
    };
  }

  follow(user: UserView, linkId: number, dto: FollowLinkDto): LinkFollowView {
    this.requireLink(user, linkId);
    const channels = [...new Set(dto.channelsKHz ?? [])].sort((a, b) => a - b);
    const watch = dto.watchChannelKHz ?? null;
    if (watch !== null && channels.length > 0 && !channels.includes(watch)) channels.push(watch);
    if (channels.length === 0 && watch === null) {
      throw badRequest('Give the channels to watch', {
        channelsKHz: 'give at least one channel, or watchChannelKHz',
      });
    }
    if (channels.length === 0 && watch !== null) channels.push(watch);
    const row = this.repo.saveFollow(
      user.id,
      linkId,
      channels.sort((a, b) => a - b),
      watch,
    );
    return {
      linkId,
      following: true,
      channelsKHz: row.channelsKHz,
      watchChannelKHz: row.watchChannelKHz,
      createdAt: row.createdAt,
    };
  }

  unfollow(user: UserView, linkId: number): void {
    this.requireLink(user, linkId);
    if (!this.repo.deleteFollow(user.id, linkId)) {
      throw new ApiException(404, `You do not follow link ${linkId}`);
    }
  }
}
