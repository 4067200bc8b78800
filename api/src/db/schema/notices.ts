import { sql } from 'drizzle-orm';
import { index, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { users } from '../schema.js';
import { links } from './links.js';

// ISO 8601 UTC text timestamps, as in schema.ts.
const nowIso = sql`(strftime('%Y-%m-%dT%H:%M:%fZ', 'now'))`;

export const NOTICE_KINDS = [
  'above-muf',
  'best-channel-changed',
  'mode-appeared',
  'mode-disappeared',
] as const;
export type NoticeKind = (typeof NOTICE_KINDS)[number];
export const NOTICE_SUBJECTS = ['net', 'link'] as const;
export type NoticeSubject = (typeof NOTICE_SUBJECTS)[number];

/**
 * One notice per subscriber and change. `change_key` is a deterministic key of the change
 * (e.g. `net:5:v3:slot:2026-12-02T14:00Z:best:7150→5350`); UNIQUE(user_id, change_key) makes the
 * watch idempotent: evaluating the same change twice stores it once.
 */
export const notices = sqliteTable(
  'notices',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    userId: integer('user_id')
      .notNull()
      .references(() => users.id),
    kind: text('kind', { enum: NOTICE_KINDS }).notNull(),
    subjectType: text('subject_type', { enum: NOTICE_SUBJECTS }).notNull(),
    subjectId: integer('subject_id').notNull(),
    changeKey: text('change_key').notNull(),
    title: text('title').notNull(),
    body: text('body').notNull(),
    data: text('data', { mode: 'json' }).$type<Record<string, unknown>>().notNull(),
    createdAt: text('created_at').notNull().default(nowIso),
    updatedAt: text('updated_at').notNull().default(nowIso),
    readAt: text('read_at'),
  },
  (t) => [
    uniqueIndex('notices_user_change_uq').on(t.userId, t.changeKey),
    index('notices_user_created_idx').on(t.userId, t.createdAt),
  ],
);

/** A browser's Web Push subscription (endpoint + ECDH/auth keys from PushManager). */
export const pushSubscriptions = sqliteTable(
  'push_subscriptions',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    userId: integer('user_id')
      .notNull()
      .references(() => users.id),
    endpoint: text('endpoint').notNull().unique(),
    keys: text('keys', { mode: 'json' }).$type<{ p256dh: string; auth: string }>().notNull(),
    createdAt: text('created_at').notNull().default(nowIso),
    updatedAt: text('updated_at').notNull().default(nowIso),
    /** Set when the user unsubscribes or the push service answers 404/410. */
    disabledAt: text('disabled_at'),
  },
  (t) => [index('push_subscriptions_user_idx').on(t.userId)],
);

/** A user following one of their links: the watch plans `channels_khz` and tells them of changes. */
export const linkFollows = sqliteTable(
  'link_follows',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    userId: integer('user_id')
      .notNull()
      .references(() => users.id),
    linkId: integer('link_id')
      .notNull()
      .references(() => links.id),
    channelsKHz: text('channels_khz', { mode: 'json' }).$type<number[]>().notNull(),
    /** The channel the user works on, watched for rising above the MUF (kHz). */
    watchChannelKHz: integer('watch_channel_khz'),
    createdAt: text('created_at').notNull().default(nowIso),
    updatedAt: text('updated_at').notNull().default(nowIso),
  },
  (t) => [uniqueIndex('link_follows_user_link_uq').on(t.userId, t.linkId)],
);

export const OUTBOX_CHANNELS = ['push', 'email'] as const;
export type OutboxChannel = (typeof OUTBOX_CHANNELS)[number];
export const OUTBOX_STATUSES = ['pending', 'sending', 'sent', 'failed'] as const;
export type OutboxStatus = (typeof OUTBOX_STATUSES)[number];

/**
 * Delivery queue: one row per (notice, channel, target) — UNIQUE, so a change is delivered once
 * per subscriber and channel. `target` is a push subscription id or an e-mail address.
 */
export const outbox = sqliteTable(
  'outbox',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    noticeId: integer('notice_id')
      .notNull()
      .references(() => notices.id),
    channel: text('channel', { enum: OUTBOX_CHANNELS }).notNull(),
    target: text('target').notNull(),
    status: text('status', { enum: OUTBOX_STATUSES }).notNull().default('pending'),
    attempts: integer('attempts').notNull().default(0),
    nextAttemptAt: text('next_attempt_at').notNull().default(nowIso),
    /** While `sending`: when the claim lapses (a crashed worker's row becomes claimable again). */
    claimedUntil: text('claimed_until'),
    lastError: text('last_error'),
    sentAt: text('sent_at'),
    createdAt: text('created_at').notNull().default(nowIso),
    updatedAt: text('updated_at').notNull().default(nowIso),
  },
  (t) => [
    uniqueIndex('outbox_notice_channel_target_uq').on(t.noticeId, t.channel, t.target),
    index('outbox_due_idx').on(t.status, t.nextAttemptAt),
  ],
);

/** Small key/value store of server settings (the VAPID key pair lives here). */
export const serverSettings = sqliteTable('server_settings', {
  key: text('key').primaryKey(),
  value: text('value', { mode: 'json' }).$type<unknown>().notNull(),
  createdAt: text('created_at').notNull().default(nowIso),
  updatedAt: text('updated_at').notNull().default(nowIso),
});

export type NoticeRow = typeof notices.$inferSelect;
export type PushSubscriptionRow = typeof pushSubscriptions.$inferSelect;
export type LinkFollowRow = typeof linkFollows.$inferSelect;
export type OutboxRow = typeof outbox.$inferSelect;

/**
 * What the watch last saw per subject and slot (best channel, modes), so that a change is judged
 * against the previous evaluation. `key` e.g. `link:7:slot:14:00`.
 */
export const watchState = sqliteTable('watch_state', {
  key: text('key').primaryKey(),
  state: text('state', { mode: 'json' }).$type<Record<string, unknown>>().notNull(),
  createdAt: text('created_at').notNull().default(nowIso),
  updatedAt: text('updated_at').notNull().default(nowIso),
});
