import { Inject, Injectable } from '@nestjs/common';
import { and, count, desc, eq, inArray, isNull } from 'drizzle-orm';
import { DB } from '../db/database.module.js';
import type { Db } from '../db/open-database.js';
import {
  linkFollows,
  notices,
  outbox,
  pushSubscriptions,
  users,
  watchState,
  type LinkFollowRow,
  type NoticeKind,
  type NoticeRow,
  type NoticeSubject,
  type PushSubscriptionRow,
} from '../db/schema.js';

const nowIso = () => new Date().toISOString();

/** A change found by the watch, for one subscriber. */
export interface NewNotice {
  userId: number;
  kind: NoticeKind;
  subjectType: NoticeSubject;
  subjectId: number;
  changeKey: string;
  title: string;
  body: string;
  data: Record<string, unknown>;
}

/** A followed link with the coordinates the watch plans for. */
export interface FollowedLink {
  userId: number;
  linkId: number;
  linkName: string;
  channelsKHz: number[];
  watchChannelKHz: number | null;
  from: { latDeg: number; lonDeg: number };
  to: { latDeg: number; lonDeg: number };
}

/** Notices, push subscriptions, link follows and the watch state (one SQLite file). */
@Injectable()
export class NoticesRepository {
  constructor(@Inject(DB) private readonly db: Db) {}

  // ----- inbox -----

  list(userId: number, page: { limit: number; offset: number; unreadOnly?: boolean }) {
    const mine = eq(notices.userId, userId);
    const where = page.unreadOnly ? and(mine, isNull(notices.readAt)) : mine;
    const rows = this.db
      .select()
      .from(notices)
      .where(where)
      .orderBy(desc(notices.createdAt), desc(notices.id))
      .limit(page.limit)
      .offset(page.offset)
      .all();
    const total = this.db.select({ n: count() }).from(notices).where(where).get()?.n ?? 0;
    return { rows, total, unread: this.unreadCount(userId) };
  }

  unreadCount(userId: number): number {
    return (
      this.db
        .select({ n: count() })
        .from(notices)
        .where(and(eq(notices.userId, userId), isNull(notices.readAt)))
        .get()?.n ?? 0
    );
  }

  findOwn(userId: number, id: number): NoticeRow | undefined {
    return this.db
      .select()
      .from(notices)
      .where(and(eq(notices.id, id), eq(notices.userId, userId)))
      .get();
  }

  /** Marks one notice read (keeps the first read time). */
  markRead(userId: number, id: number): NoticeRow | undefined {
    const at = nowIso();
    this.db
      .update(notices)
      .set({ readAt: at, updatedAt: at })
      .where(and(eq(notices.id, id), eq(notices.userId, userId), isNull(notices.readAt)))
      .run();
    return this.findOwn(userId, id);
  }

  markAllRead(userId: number): number {
    const at = nowIso();
    return this.db
      .update(notices)
      .set({ readAt: at, updatedAt: at })
      .where(and(eq(notices.userId, userId), isNull(notices.readAt)))
      .run().changes;
  }

  // ----- push subscriptions -----

  /**
   * Stores a browser's subscription. The endpoint is unique to a browser profile: a second
   * sign-in on the same browser moves it to that user and re-enables it.
   */
  savePushSubscription(
    userId: number,
    endpoint: string,
    keys: { p256dh: string; auth: string },
  ): PushSubscriptionRow {
    const at = nowIso();
    return this.db
      .insert(pushSubscriptions)
      .values({ userId, endpoint, keys })
      .onConflictDoUpdate({
        target: pushSubscriptions.endpoint,
        set: { userId, keys, disabledAt: null, updatedAt: at },
      })
      .returning()
      .get();
  }

  /** Disables the user's subscription with this endpoint; false if there is none. */
  disablePushSubscription(userId: number, endpoint: string): boolean {
    const at = nowIso();
    return (
      this.db
        .update(pushSubscriptions)
        .set({ disabledAt: at, updatedAt: at })
        .where(
          and(
            eq(pushSubscriptions.userId, userId),
            eq(pushSubscriptions.endpoint, endpoint),
            isNull(pushSubscriptions.disabledAt),
          ),
        )
        .run().changes > 0
    );
  }

  activePushSubscriptionCount(userId: number): number {
    return (
      this.db
        .select({ n: count() })
        .from(pushSubscriptions)
        .where(and(eq(pushSubscriptions.userId, userId), isNull(pushSubscriptions.disabledAt)))
        .get()?.n ?? 0
    );
  }

  // ----- link follows -----

  findFollow(userId: number, linkId: number): LinkFollowRow | undefined {
    return this.db
      .select()
      .from(linkFollows)
      .where(and(eq(linkFollows.userId, userId), eq(linkFollows.linkId, linkId)))
      .get();
  }

  saveFollow(
    userId: number,
    linkId: number,
    channelsKHz: number[],
    watchChannelKHz: number | null,
  ): LinkFollowRow {
    return this.db
      .insert(linkFollows)
      .values({ userId, linkId, channelsKHz, watchChannelKHz })
      .onConflictDoUpdate({
        target: [linkFollows.userId, linkFollows.linkId],
        set: { channelsKHz, watchChannelKHz, updatedAt: nowIso() },
      })
      .returning()
      .get();
  }

  deleteFollow(userId: number, linkId: number): boolean {
    return (
      this.db
        .delete(linkFollows)
        .where(and(eq(linkFollows.userId, userId), eq(linkFollows.linkId, linkId)))
        .run().changes > 0
    );
  }

  /** Every follow of a live link by an enabled user, with the link's station coordinates. */
  followedLinks(): FollowedLink[] {
    const rows = this.db.$client
      .prepare(
        `select f.user_id as userId, f.link_id as linkId, l.name as linkName,
                f.channels_khz as channelsKHz, f.watch_channel_khz as watchChannelKHz,
                a.lat_deg as fromLat, a.lon_deg as fromLon, b.lat_deg as toLat, b.lon_deg as toLon
           from link_follows f
           join links l on l.id = f.link_id and l.deleted_at is null
           join stations a on a.id = l.from_station_id
           join stations b on b.id = l.to_station_id
           join users u on u.id = f.user_id and u.disabled = 0
          order by f.link_id, f.user_id`,
      )
      .all() as {
      userId: number;
      linkId: number;
      linkName: string;
      channelsKHz: string;
      watchChannelKHz: number | null;
      fromLat: number;
      fromLon: number;
      toLat: number;
      toLon: number;
    }[];
    return rows.map((r) => ({
      userId: r.userId,
      linkId: r.linkId,
      linkName: r.linkName,
      channelsKHz: JSON.parse(r.channelsKHz) as number[],
      watchChannelKHz: r.watchChannelKHz,
      from: { latDeg: r.fromLat, lonDeg: r.fromLon },
      to: { latDeg: r.toLat, lonDeg: r.toLon },
    }));
  }

  // ----- the watch's writes -----

  /**
   * Stores notices (once per user and change key) and, for each new one, the outbox rows of the
   * user's active push subscriptions and their e-mail address — and the new watch state — in ONE
   * transaction. Returns the notices actually inserted.
   */
  storeChanges(
    changes: NewNotice[],
    state: { key: string; value: Record<string, unknown> }[],
    channels: { push: boolean; email: boolean },
  ): NoticeRow[] {
    return this.db.transaction((tx) => {
      const inserted: NoticeRow[] = [];
      for (const change of changes) {
        const row = tx
          .insert(notices)
          .values(change)
          .onConflictDoNothing({ target: [notices.userId, notices.changeKey] })
          .returning()
          .get();
        if (!row) continue;
        inserted.push(row);
        const targets: { channel: 'push' | 'email'; target: string }[] = [];
        if (channels.push) {
          const subs = tx
            .select({ id: pushSubscriptions.id })
            .from(pushSubscriptions)
            .where(
              and(
                eq(pushSubscriptions.userId, change.userId),
                isNull(pushSubscriptions.disabledAt),
              ),
            )
            .all();
          for (const s of subs) targets.push({ channel: 'push', target: String(s.id) });
        }
        if (channels.email) {
          const user = tx
            .select({ email: users.email })
            .from(users)
            .where(and(eq(users.id, change.userId), eq(users.disabled, false)))
            .get();
          if (user) targets.push({ channel: 'email', target: user.email });
        }
        if (targets.length > 0) {
          tx.insert(outbox)
            .values(targets.map((t) => ({ noticeId: row.id, ...t })))
            .onConflictDoNothing()
            .run();
        }
      }
      for (const s of state) {
        tx.insert(watchState)
          .values({ key: s.key, state: s.value })
          .onConflictDoUpdate({
            target: watchState.key,
            set: { state: s.value, updatedAt: nowIso() },
          })
          .run();
      }
      return inserted;
    });
  }

  watchStates(keys: string[]): Map<string, Record<string, unknown>> {
    if (keys.length === 0) return new Map();
    const rows = this.db.select().from(watchState).where(inArray(watchState.key, keys)).all();
    return new Map(rows.map((r) => [r.key, r.state]));
  }
}
