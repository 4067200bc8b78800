import { sql } from 'drizzle-orm';
import { index, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { users } from '../schema.js';
import { stations } from './links.js';
import type { NetProfileSource, ScheduleSlot } from '@hopwise/common';

export type { NetProfileSource, ScheduleSlot };

// ISO 8601 UTC text timestamps, as in schema.ts.
const nowIso = sql`(strftime('%Y-%m-%dT%H:%M:%fZ', 'now'))`;

/** A net: a control station, member stations and assigned channels. Soft-deleted. */
export const nets = sqliteTable(
  'nets',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    ownerId: integer('owner_id')
      .notNull()
      .references(() => users.id),
    name: text('name').notNull(),
    controlStationId: integer('control_station_id')
      .notNull()
      .references(() => stations.id),
    /** Assigned channels [kHz], ascending integers 3000–30000, no duplicates. */
    channelsKHz: text('channels_khz', { mode: 'json' }).$type<number[]>().notNull(),
    createdAt: text('created_at').notNull().default(nowIso),
    updatedAt: text('updated_at').notNull().default(nowIso),
    deletedAt: text('deleted_at'),
  },
  (t) => [
    uniqueIndex('nets_owner_name_live_uq')
      .on(t.ownerId, t.name)
      .where(sql`${t.deletedAt} is null`),
  ],
);

export const netMembers = sqliteTable(
  'net_members',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    netId: integer('net_id')
      .notNull()
      .references(() => nets.id),
    stationId: integer('station_id')
      .notNull()
      .references(() => stations.id),
    createdAt: text('created_at').notNull().default(nowIso),
    updatedAt: text('updated_at').notNull().default(nowIso),
  },
  (t) => [
    uniqueIndex('net_members_net_station_uq').on(t.netId, t.stationId),
    index('net_members_station_idx').on(t.stationId),
  ],
);

/** The controller's channel choice for one slot of the draft (null channel = no transmission). */
export const scheduleOverrides = sqliteTable(
  'schedule_overrides',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    netId: integer('net_id')
      .notNull()
      .references(() => nets.id),
    ownerId: integer('owner_id')
      .notNull()
      .references(() => users.id),
    startUtc: text('start_utc').notNull(),
    channelKHz: integer('channel_khz'),
    createdAt: text('created_at').notNull().default(nowIso),
    updatedAt: text('updated_at').notNull().default(nowIso),
  },
  (t) => [uniqueIndex('schedule_overrides_net_start_uq').on(t.netId, t.startUtc)],
);

/** A published schedule: each publish is a new immutable version (1, 2, …) per net. */
export const schedules = sqliteTable(
  'schedules',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    netId: integer('net_id')
      .notNull()
      .references(() => nets.id),
    version: integer('version').notNull(),
    dateUtc: text('date_utc').notNull(),
    slotMinutes: integer('slot_minutes').notNull(),
    publishedAt: text('published_at').notNull().default(nowIso),
    publishedBy: integer('published_by')
      .notNull()
      .references(() => users.id),
    profileSource: text('profile_source', { mode: 'json' }).$type<NetProfileSource>().notNull(),
    /** Channels and members as published (later edits of the net do not change a version). */
    channelsKHz: text('channels_khz', { mode: 'json' }).$type<number[]>().notNull(),
    memberStationIds: text('member_station_ids', { mode: 'json' }).$type<number[]>().notNull(),
    slots: text('slots', { mode: 'json' }).$type<ScheduleSlot[]>().notNull(),
    createdAt: text('created_at').notNull().default(nowIso),
    updatedAt: text('updated_at').notNull().default(nowIso),
  },
  (t) => [uniqueIndex('schedules_net_version_uq').on(t.netId, t.version)],
);

export type NetRow = typeof nets.$inferSelect;
export type NetMemberRow = typeof netMembers.$inferSelect;
export type ScheduleOverrideRow = typeof scheduleOverrides.$inferSelect;
export type ScheduleRow = typeof schedules.$inferSelect;
